import "fake-indexeddb/auto";
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { onlineManager } from "@tanstack/react-query";
import { get } from "idb-keyval";
import { renderApp, json } from "../render-app.tsx";
import { benchTestFlow, buildSession, stubSessionApi, storedAnswer } from "./session-fakes.ts";
import type { AppendEventRequest } from "../../../shared/schemas/sessions.ts";

// The guard step asks for a photo of the unit before anything is touched.
function sessionWithPhotoStep() {
  const detail = buildSession();
  const guard = benchTestFlow.steps.guard!;
  return { ...detail, definition: { ...benchTestFlow, steps: { ...benchTestFlow.steps, guard: { ...guard, photo: { requirement: "required" as const, prompt: "Photograph the plug cap" } } } } };
}

beforeEach(() => {
  // jsdom has no object URLs; the thumbnail only needs an address.
  vi.stubGlobal("URL", Object.assign(URL, { createObjectURL: () => "blob:thumb", revokeObjectURL: () => undefined }));
});
afterEach(() => onlineManager.setOnline(true));

describe("a photo on the bench without a connection", () => {
  it("keeps the photo on the tablet, opens the step at once, and sends the photo before the event that names it", async () => {
    const order: string[] = [];
    const uploads: FormData[] = [];
    const posted = stubSessionApi(
      sessionWithPhotoStep(),
      async (request: AppendEventRequest) => {
        order.push(`event ${request.event.type}`);
        return storedAnswer(request);
      },
      async (form) => {
        uploads.push(form);
        order.push("photo");
        return json({ id: form.get("id"), width: 640, height: 480, url: `/api/attachments/${String(form.get("id"))}`, thumbUrl: `/api/attachments/${String(form.get("id"))}/thumb` }, { status: 201 });
      },
    );
    renderApp("/bench/sessions/se-1");
    await screen.findByRole("heading", { level: 1, name: "Is the spark plug cap off?" }, { timeout: 5000 });
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Read and understood" }));
    await waitFor(() => expect(posted).toHaveLength(1));

    onlineManager.setOnline(false);
    expect(screen.getByText(/Take the photo first: Photograph the plug cap/)).toBeInTheDocument();
    const photo = new File([new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3])], "cap.jpg", { type: "image/jpeg" });
    await user.upload(screen.getByLabelText("Take the photo"), photo);
    expect(await screen.findByText("✓ 1 photo kept for this step.")).toBeInTheDocument();
    const answers = screen.getByRole("group", { name: "Answers" });
    for (const button of within(answers).getAllByRole("button")) expect(button).toBeEnabled();
    await user.click(within(answers).getByRole("button", { name: "Yes, the cap is off" }));
    expect(screen.getByRole("heading", { level: 1, name: "Record the highest gauge reading" })).toBeInTheDocument();
    expect(screen.getByText("Waiting for the connection (2 answers and 1 photo kept on this tablet)")).toBeInTheDocument();
    expect(uploads).toHaveLength(0);

    onlineManager.setOnline(true);
    await waitFor(() => expect(screen.getByText("Saved")).toBeInTheDocument(), { timeout: 5000 });
    expect(order).toEqual(["event caution.acknowledge", "photo", "event photo.attach", "event step.answer"]);
    const attach = posted.find((r) => r.event.type === "photo.attach")!;
    expect(attach.event).toMatchObject({ stepId: "guard", attachmentId: uploads[0]!.get("id") });
    expect(uploads[0]!.get("stepId")).toBe("guard");
    // Sent, the tablet's copy is let go.
    expect(await get(`benchpath-photo-${String(uploads[0]!.get("id"))}`)).toBeUndefined();
  });

  it("refuses a file that is not a picture beside the photo button, and queues nothing", async () => {
    const posted = stubSessionApi(sessionWithPhotoStep(), storedAnswer, async () => {
      throw new Error("no upload expected");
    });
    renderApp("/bench/sessions/se-1");
    await screen.findByRole("heading", { level: 1, name: "Is the spark plug cap off?" }, { timeout: 5000 });
    const user = userEvent.setup({ applyAccept: false });
    await user.upload(screen.getByLabelText("Take the photo"), new File(["just words"], "notes.txt", { type: "text/plain" }));
    expect(await screen.findByText("That file is not a picture. Take the photo with the camera.")).toBeInTheDocument();
    expect(screen.queryByText(/photo kept/)).not.toBeInTheDocument();
    expect(posted).toHaveLength(0);
  });
});
