import type { OutgoingMail } from "../../../../shared/schemas/mail.ts";
import { StatePill } from "../../../components/ui/state-pill.tsx";
import { kindWords, localDayTime, statusWords } from "../lib/mail-words.ts";

/** What the shop handed to the mail server, newest first; a failure shows its reason in the row. */
export function OutgoingTable({ messages }: { messages: OutgoingMail[] }) {
  if (messages.length === 0)
    return (
      <p className="rounded-xl border-2 border-dashed border-line-strong px-5 py-4">
        Nothing has been sent yet. Invitations, password resets and estimates appear here once they go out.
      </p>
    );
  return (
    <div className="overflow-x-auto rounded-lg border-2 border-line">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Mail the shop sent, newest first</caption>
        <thead>
          <tr className="border-b-2 border-line-strong bg-sunken">
            {["When", "Message", "Kind", "How it went"].map((h) => (
              <th key={h} scope="col" className="px-4 py-3 text-base font-semibold whitespace-nowrap">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {messages.map((m) => {
            const status = statusWords[m.status];
            return (
              <tr key={m.id} className="border-b border-line align-top last:border-b-0">
                <td className="px-4 py-3 whitespace-nowrap tabular-figures">{localDayTime(m.createdAt)}</td>
                <th scope="row" className="min-w-56 px-4 py-3 text-left font-normal">
                  <span className="block font-semibold">{m.subject}</span>
                  <span className="block text-base text-ink-muted [overflow-wrap:anywhere]">To {m.to}</span>
                </th>
                <td className="px-4 py-3 whitespace-nowrap">{kindWords[m.kind]}</td>
                <td className="min-w-40 px-4 py-3">
                  <StatePill shape={status.shape}>{status.label}</StatePill>
                  {m.error && <p className="mt-2 text-base text-problem">{m.error}</p>}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
