import { useState, type ChangeEvent } from "react";
import { Link } from "react-router";
import { z } from "zod";
import { MAX_IMPORT_BYTES, problemSchema } from "../../../../shared/schemas/flows.ts";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useImportFlow } from "../api/import-flow.ts";
import { flowPath } from "../api/keys.ts";
import { countInWords } from "../lib/flow-words.ts";
import { ProblemList } from "./problem-list.tsx";

type Refusal = { title: string; body: string; problems?: z.infer<typeof problemSchema>[] };

/** Reads a flow file in the browser; only a file that holds a JSON object is sent. */
export async function readFlowFile(file: File): Promise<{ ok: true; document: Record<string, unknown> } | { ok: false; refusal: Refusal }> {
  const notSent = "It was not sent to the server.";
  if (file.size > MAX_IMPORT_BYTES) {
    return { ok: false, refusal: { title: `“${file.name}” is too big to be a flow file.`, body: `A flow file is at most ${MAX_IMPORT_BYTES / 1024} KB. ${notSent}` } };
  }
  let document: unknown;
  try {
    document = JSON.parse(await file.text());
  } catch (error) {
    const reason = error instanceof Error ? error.message : "it cannot be read";
    return { ok: false, refusal: { title: `“${file.name}” is not valid JSON.`, body: `${reason}. ${notSent} Export the flow from Benchpath again, or fix the file in a text editor.` } };
  }
  if (typeof document !== "object" || document === null || Array.isArray(document)) {
    return { ok: false, refusal: { title: `“${file.name}” holds JSON, but not a flow.`, body: `A flow file is one JSON object with an id, a title and steps. ${notSent}` } };
  }
  return { ok: true, document: document as Record<string, unknown> };
}

const refusedDetails = z.object({ problems: z.array(problemSchema) });

function serverRefusal(error: unknown): Refusal {
  if (!isApiRequestError(error)) return { title: "The file was not imported.", body: "Something went wrong; try again." };
  const details = refusedDetails.safeParse(error.details);
  return { title: "The server did not import the file.", body: error.message, problems: details.success ? details.data.problems : undefined };
}

export function ImportFlow() {
  const importFlow = useImportFlow();
  const [refusal, setRefusal] = useState<Refusal | null>(null);

  const onFile = async (event: ChangeEvent<HTMLInputElement>) => {
    const input = event.currentTarget;
    const file = input.files?.[0];
    input.value = "";
    if (!file) return;
    importFlow.reset();
    setRefusal(null);
    const read = await readFlowFile(file);
    if (!read.ok) {
      setRefusal(read.refusal);
      return;
    }
    importFlow.mutate(read.document, { onError: (error) => setRefusal(serverRefusal(error)) });
  };

  const result = importFlow.data;
  const errors = result?.problems.filter((p) => p.severity === "error").length ?? 0;
  return (
    <section aria-labelledby="import-title" className="flex flex-col gap-3">
      <h2 id="import-title" className="sr-only">
        Import a flow
      </h2>
      <label className="inline-flex min-h-12 cursor-pointer items-center gap-2 self-start rounded-lg border-2 border-line-strong bg-raised px-5 font-semibold has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-focus">
        {importFlow.isPending ? "Importing…" : "Import a flow file"}
        <input type="file" accept=".json,application/json" className="sr-only" disabled={importFlow.isPending} onChange={(event) => void onFile(event)} />
      </label>
      {refusal && (
        <FormProblem title={refusal.title}>
          <p>{refusal.body}</p>
          {refusal.problems && refusal.problems.length > 0 && <ProblemList problems={refusal.problems} />}
        </FormProblem>
      )}
      {result && (
        <div role="status" className="flex flex-col gap-2 rounded-lg border-2 border-accent bg-accent-soft px-4 py-3">
          <p className="font-semibold">
            {result.created ? `Imported as a new flow, “${result.flowId}”` : `Imported as the draft of “${result.flowId}”`}
            {result.problems.length === 0 ? ", with no problems." : errors > 0 ? `, with ${countInWords(errors, "error")} to fix before it can be published.` : ", with warnings only."}
          </p>
          {result.problems.length > 0 && <ProblemList problems={result.problems} />}
          <Link to={flowPath(result.flowId)} className="self-start font-semibold text-accent underline decoration-2 underline-offset-4">
            Open the draft
          </Link>
        </div>
      )}
    </section>
  );
}
