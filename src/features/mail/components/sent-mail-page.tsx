import { useQuery } from "@tanstack/react-query";
import { Link, useSearchParams } from "react-router";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { inboxQueryOptions } from "../api/get-inbox.ts";
import { outgoingQueryOptions } from "../api/list-outgoing.ts";
import { OutgoingTable } from "./outgoing-table.tsx";
import { ReceivedMail } from "./received-mail.tsx";

/** /people/mail: what the shop sent and how it went; with the built-in sink, what arrived. */
export function SentMailPage() {
  const outgoing = useQuery(outgoingQueryOptions());
  const inbox = useQuery(inboxQueryOptions());
  const [params, setParams] = useSearchParams();
  const chosen = params.get("message");
  const choose = (id: string) => setParams(new URLSearchParams({ message: id }), { replace: true });

  return (
    <div className="flex max-w-6xl min-w-0 flex-col gap-8">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div className="flex flex-col gap-1">
          <h1 className="text-step font-semibold">Sent mail</h1>
          <p className="max-w-[65ch] text-ink-muted">Every message the shop tried to send, and whether the mail server took it.</p>
        </div>
        <Link to="/people" className={buttonClasses()}>
          Back to People
        </Link>
      </div>

      <section aria-labelledby="outgoing-title" className="flex min-w-0 flex-col gap-4">
        <h2 id="outgoing-title" className="text-2xl font-semibold">
          What was sent
        </h2>
        {outgoing.isPending ? (
          <p className="text-ink-muted">Loading…</p>
        ) : outgoing.isError ? (
          <FormProblem title="The list of sent mail did not load.">Check that this tablet is on the shop's network, then reload.</FormProblem>
        ) : (
          <OutgoingTable messages={outgoing.data.messages} />
        )}
      </section>

      <section aria-labelledby="inbox-title" className="flex min-w-0 flex-col gap-4">
        <h2 id="inbox-title" className="text-2xl font-semibold">
          What arrived
        </h2>
        {inbox.isPending ? (
          <p className="text-ink-muted">Loading…</p>
        ) : inbox.isError ? (
          <FormProblem title="The received mail did not load.">Check that this tablet is on the shop's network, then reload.</FormProblem>
        ) : inbox.data.mode === "smtp" ? (
          <p className="max-w-[65ch]">Mail goes out through the shop's mail server ({inbox.data.where}), so what arrived is in each recipient's own inbox, not here.</p>
        ) : (
          <>
            <p className="max-w-[65ch] text-ink-muted">No mail server is set (SMTP_URL), so every message stays in Benchpath's built-in mail sink: nothing leaves the shop. Here is what it received.</p>
            <ReceivedMail messages={inbox.data.messages} chosen={chosen} onChoose={choose} />
          </>
        )}
      </section>
    </div>
  );
}
