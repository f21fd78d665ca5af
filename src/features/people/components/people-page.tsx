import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Link } from "react-router";
import type { InviteResponse, Person } from "../../../../shared/schemas/people.ts";
import { Button, buttonClasses } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { peopleQueryOptions } from "../api/list-people.ts";
import { useResendInvite } from "../api/resend-invite.ts";
import { InviteForm } from "./invite-form.tsx";
import { PersonRow } from "./person-row.tsx";

interface PeoplePageProps {
  /** The signed-in shop lead. */
  meId: string;
  /** After a change to the lead's own role or standing, which ends their session. */
  onOwnChange: () => void;
}

/** The shop lead's people: invite, set roles, deactivate and reactivate, resend invitations. */
export function PeoplePage({ meId, onOwnChange }: PeoplePageProps) {
  const people = useQuery(peopleQueryOptions());
  const resend = useResendInvite();
  const [outcome, setOutcome] = useState<InviteResponse | null>(null);

  const resendTo = (person: Person) => resend.mutate(person.id, { onSuccess: setOutcome });

  return (
    <div className="flex max-w-5xl min-w-0 flex-col gap-8">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div className="flex flex-col gap-1">
          <h1 className="text-step font-semibold">People</h1>
          <p className="max-w-[65ch] text-ink-muted">Who works in the shop, what each person may do, and who can sign in.</p>
        </div>
        <Link to="/people/mail" className={buttonClasses()}>
          Sent mail
        </Link>
      </div>

      <InviteForm onInvited={setOutcome} />
      <div aria-live="polite">
        {outcome && <MailOutcome outcome={outcome} onResend={() => resendTo(outcome.person)} resending={resend.isPending} />}
        {resend.isError && <FormProblem title="The invitation was not sent again.">{resend.error.message}</FormProblem>}
      </div>

      <section aria-labelledby="people-title" className="flex flex-col gap-4">
        <h2 id="people-title" className="text-2xl font-semibold">
          Everyone in the shop
        </h2>
        {people.isPending ? (
          <p className="text-ink-muted">Loading the people…</p>
        ) : people.isError ? (
          <FormProblem title="The list of people did not load.">Check that this tablet is on the shop's network, then reload.</FormProblem>
        ) : (
          <ul className="flex flex-col gap-3">
            {people.data.people.map((person) => (
              <PersonRow key={person.id} person={person} isMe={person.id === meId} onResend={resendTo} resending={resend.isPending && resend.variables === person.id} onOwnChange={onOwnChange} />
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}

function MailOutcome({ outcome, onResend, resending }: { outcome: InviteResponse; onResend: () => void; resending: boolean }) {
  const { person, mail } = outcome;
  if (mail.status === "sent")
    return (
      <p role="status" className="rounded-lg border-2 border-accent bg-accent-soft px-4 py-3 text-lg">
        <span aria-hidden="true">✓ </span>
        An invitation is on its way to {person.name} at {person.email}.
      </p>
    );
  return (
    <FormProblem title={`The invitation to ${person.name} was not sent.`}>
      <p>{mail.error}</p>
      <p className="mt-1">
        {person.name} is on the list below as invited. Fix the mail server, then send it again.
      </p>
      <Button onClick={onResend} disabled={resending} className="mt-3">
        {resending ? "Sending…" : "Send it again"}
      </Button>
    </FormProblem>
  );
}
