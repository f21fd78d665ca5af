import { screen, waitFor, within } from "@testing-library/react";
import userEvent, { type UserEvent } from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { answers, buildDetail } from "./fakes.ts";

const apprentice = meAnswers(signedInAs("apprentice"));

async function openIntake() {
  const view = renderApp("/work-orders/new");
  // The first lazy route import in a run can take over a second to transform.
  await screen.findByRole("heading", { level: 1, name: "Check in a unit" }, { timeout: 5000 });
  return view;
}

async function fillValid(user: UserEvent) {
  await user.type(screen.getByRole("textbox", { name: "Customer's name" }), "Dana Whitcombe");
  await user.type(screen.getByRole("textbox", { name: "Phone" }), "555 0142");
  await user.type(screen.getByRole("textbox", { name: "E-mail" }), "Dana@Example.com");
  await user.click(screen.getByRole("radio", { name: "String trimmer" }));
  await user.type(screen.getByRole("textbox", { name: "Make" }), "Hollis");
  await user.type(screen.getByRole("textbox", { name: "Model" }), "TR-22");
  await user.type(screen.getByRole("textbox", { name: "Engine model" }), "HE-25");
  await user.type(screen.getByRole("textbox", { name: "Engine type or spec code" }), "A1");
  await user.click(screen.getByRole("radio", { name: "2-stroke" }));
  await user.type(screen.getByRole("textbox", { name: "Displacement in cc" }), "25.4");
  await user.type(screen.getByRole("textbox", { name: "What the customer says is wrong" }), "Pulls over but never catches.");
  await user.type(screen.getByRole("textbox", { name: "What they already tried" }), "New spark plug.");
  await user.click(screen.getByRole("radio", { name: "Stale fuel" }));
}

const expectedBody = {
  customer: { name: "Dana Whitcombe", phone: "555 0142", email: "dana@example.com" },
  unit: {
    equipmentKind: "string_trimmer",
    make: "Hollis",
    model: "TR-22",
    engineModel: "HE-25",
    engineType: "A1",
    engineSerial: "",
    cycle: 2,
    displacementCc: 25.4,
    compressionRelease: "unknown",
    hours: null,
  },
  complaint: "Pulls over but never catches.",
  alreadyTried: "New spark plug.",
  tankContents: "stale",
};

describe("checking in a unit", () => {
  it("marks each needed answer beside its field when sent empty, and sends nothing", async () => {
    const fetchMock = stubApi(apprentice);
    await openIntake();
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Check in" }));

    const name = screen.getByRole("textbox", { name: "Customer's name" });
    expect(name).toHaveAttribute("aria-invalid", "true");
    expect(name).toHaveAccessibleDescription("Enter the customer's name.");
    expect(name).toHaveFocus();
    expect(screen.getByRole("textbox", { name: "Make" })).toHaveAccessibleDescription("Enter the make as printed on the unit.");
    expect(screen.getByRole("textbox", { name: "Model" })).toHaveAccessibleDescription("Enter the model as printed on the unit.");
    expect(screen.getByRole("radiogroup", { name: "What kind of equipment is it?" })).toHaveAccessibleDescription("Choose the kind of equipment.");
    expect(screen.getByRole("radiogroup", { name: "2-stroke or 4-stroke?" })).toHaveAccessibleDescription(/^Choose 2-stroke or 4-stroke\./);
    expect(screen.getByRole("textbox", { name: "What the customer says is wrong" })).toHaveAccessibleDescription(/^Write the complaint in the customer's words\./);
    expect(screen.getByRole("radiogroup", { name: "What is in the tank?" })).toHaveAccessibleDescription("Choose what is in the tank.");
    expect(screen.getByRole("textbox", { name: "Phone" })).not.toHaveAttribute("aria-invalid");

    const summary = screen.getAllByRole("alert")[0]!;
    expect(summary).toHaveTextContent("7 answers need fixing before this unit can be checked in.");
    await user.click(within(summary).getByRole("link", { name: "Go to the first: Customer's name" }));
    expect(name).toHaveFocus();
    expect(fetchMock.mock.calls.map(([url]) => String(url))).toEqual(["/api/auth/me"]);
  });

  it("posts the answers with numbers as numbers and empty numbers as null, then opens the new work order", async () => {
    let posted: unknown;
    stubApi(
      apprentice,
      answers("POST", "/api/work-orders", (body) => {
        posted = body;
        return json(buildDetail({ id: "wo-77", number: 1077 }), { status: 201 });
      }),
    );
    const { router } = await openIntake();
    const user = userEvent.setup();
    await fillValid(user);
    await user.click(screen.getByRole("button", { name: "Check in" }));

    await waitFor(() => expect(router.state.location.pathname).toBe("/work-orders/wo-77"), { timeout: 5000 });
    expect(posted).toEqual(expectedBody);
    expect(await screen.findByText("WO 1077", {}, { timeout: 5000 })).toBeInTheDocument();
  });

  it("uploads the intake photo after the work order is made", async () => {
    const uploads: FormData[] = [];
    const fetchMock = stubApi(apprentice, answers("POST", "/api/work-orders", () => json(buildDetail({ id: "wo-77" }), { status: 201 })));
    const base = fetchMock.getMockImplementation()!;
    fetchMock.mockImplementation(async (input, init) => {
      if (String(input) === "/api/work-orders/wo-77/intake-photo" && init?.body instanceof FormData) {
        uploads.push(init.body);
        return json({ id: "ph-1", url: "/photos/ph-1", thumbUrl: "/photos/ph-1/thumb" }, { status: 201 });
      }
      return base(input, init);
    });
    const { router } = await openIntake();
    const user = userEvent.setup();
    await fillValid(user);
    const photo = new File(["not really a jpeg"], "unit.jpg", { type: "image/jpeg" });
    await user.upload(screen.getByLabelText("Take a photo"), photo);
    await user.click(screen.getByRole("button", { name: "Check in" }));

    await waitFor(() => expect(router.state.location.pathname).toBe("/work-orders/wo-77"), { timeout: 5000 });
    expect(uploads).toHaveLength(1);
    expect(uploads[0]!.get("photo")).toBe(photo);
  });

  it("still opens the new work order when its photo does not save, and says to take it again", async () => {
    stubApi(
      apprentice,
      answers("POST", "/api/work-orders", () => json(buildDetail({ id: "wo-77" }), { status: 201 })),
      answers("POST", "/api/work-orders/wo-77/intake-photo", () => json({ error: { id: "too_large", message: "Too big." } }, { status: 413 })),
    );
    const { router } = await openIntake();
    const user = userEvent.setup();
    await fillValid(user);
    await user.upload(screen.getByLabelText("Take a photo"), new File(["x"], "unit.jpg", { type: "image/jpeg" }));
    await user.click(screen.getByRole("button", { name: "Check in" }));

    await waitFor(() => expect(router.state.location.pathname).toBe("/work-orders/wo-77"), { timeout: 5000 });
    expect(await screen.findByRole("alert")).toHaveTextContent("Checked in, but the photo of the unit did not save.");
    expect(screen.getByLabelText("Take a photo")).toHaveAccessibleDescription("The photo taken at check-in did not save: take it again, then save it.");
  });

  it("puts the server's message for a field beside that field", async () => {
    stubApi(
      apprentice,
      answers("POST", "/api/work-orders", () =>
        json(
          { error: { id: "invalid_input", message: "Check the answers.", details: { fieldErrors: { "unit.model": ["Use the model as printed, without spaces."] }, formErrors: [] } } },
          { status: 400 },
        ),
      ),
    );
    const { router } = await openIntake();
    const user = userEvent.setup();
    await fillValid(user);
    await user.click(screen.getByRole("button", { name: "Check in" }));

    const model = screen.getByRole("textbox", { name: "Model" });
    await waitFor(() => expect(model).toHaveAttribute("aria-invalid", "true"));
    expect(model).toHaveAccessibleDescription("Use the model as printed, without spaces.");
    expect(model).toHaveValue("TR-22");
    expect(router.state.location.pathname).toBe("/work-orders/new");
  });

  it("keeps everything typed when the server cannot be reached, and says so", async () => {
    stubApi(apprentice, ({ url, method }) => {
      if (url === "/api/work-orders" && method === "POST") throw new TypeError("Failed to fetch");
      return undefined;
    });
    const { router } = await openIntake();
    const user = userEvent.setup();
    await fillValid(user);
    await user.click(screen.getByRole("button", { name: "Check in" }));

    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("Not checked in: Benchpath cannot reach the shop's server.");
    expect(alert).toHaveTextContent("Everything you typed is still here.");
    expect(screen.getByRole("textbox", { name: "Customer's name" })).toHaveValue("Dana Whitcombe");
    expect(screen.getByRole("textbox", { name: "E-mail" })).toHaveValue("Dana@Example.com");
    expect(screen.getByRole("textbox", { name: "Displacement in cc" })).toHaveValue("25.4");
    expect(screen.getByRole("textbox", { name: "What the customer says is wrong" })).toHaveValue("Pulls over but never catches.");
    expect(screen.getByRole("radio", { name: "String trimmer" })).toBeChecked();
    expect(screen.getByRole("radio", { name: "2-stroke" })).toBeChecked();
    expect(screen.getByRole("radio", { name: "Stale fuel" })).toBeChecked();
    expect(router.state.location.pathname).toBe("/work-orders/new");
  });
});
