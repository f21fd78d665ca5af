import { useState } from "react";
import type { Person } from "../../../../shared/schemas/people.ts";
import { roleLabels, roles, type Role } from "../../../../shared/schemas/users.ts";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog } from "../../../components/ui/dialog.tsx";
import { FieldError } from "../../../components/ui/field-error.tsx";
import { StatePill } from "../../../components/ui/state-pill.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useUpdatePerson } from "../api/update-person.ts";
import { localDay, localDayTime, statusWords } from "../lib/people-words.ts";

type Pending = { kind: "role"; role: Role } | { kind: "active"; active: boolean };

interface PersonRowProps {
  person: Person;
  isMe: boolean;
  onResend: (person: Person) => void;
  resending: boolean;
  /** Runs after a change to the signed-in person's own standing, which signs them out. */
  onOwnChange: () => void;
}

function problemWords(error: unknown): string {
  if (isApiRequestError(error) && error.status >= 400 && error.status < 500) return error.message;
  return "Not saved: Benchpath could not reach the shop's server. Check the connection and try again.";
}

/** One person: who they are, where they stand, their role and what the shop lead can do about it. */
export function PersonRow({ person, isMe, onResend, resending, onOwnChange }: PersonRowProps) {
  const update = useUpdatePerson();
  const [pending, setPending] = useState<Pending | null>(null);
  const status = statusWords[person.status];
  const errorId = `person-${person.id}-error`;

  const confirm = () => {
    if (!pending) return;
    const change = pending.kind === "role" ? { role: pending.role } : { active: pending.active };
    setPending(null);
    update.mutate({ id: person.id, change }, { onSuccess: () => isMe && onOwnChange() });
  };

  return (
    <li className="flex flex-col gap-3 rounded-xl border-2 border-line bg-raised px-5 py-4" aria-label={person.name}>
      <div className="grid items-start gap-x-6 gap-y-3 md:grid-cols-[minmax(0,1fr)_auto]">
        <div className="flex min-w-0 flex-col gap-1">
          <p className="text-xl font-semibold">
            {person.name}
            {isMe && <span className="ml-2 text-base font-medium text-ink-muted">(you)</span>}
          </p>
          <p className="text-ink-muted [overflow-wrap:anywhere]">{person.email}</p>
          <div className="mt-1 flex flex-wrap items-center gap-x-4 gap-y-2 text-base">
            <StatePill shape={status.shape}>{status.label}</StatePill>
            <span className="text-ink-muted">{dates(person)}</span>
          </div>
        </div>
        <div className="flex flex-wrap items-end gap-3 md:justify-end">
          <div className="flex flex-col gap-1">
            <label htmlFor={`role-${person.id}`} className="text-base font-semibold">
              Role
            </label>
            <select
              id={`role-${person.id}`}
              value={person.role}
              disabled={update.isPending}
              aria-describedby={update.isError ? errorId : undefined}
              onChange={(event) => setPending({ kind: "role", role: event.target.value as Role })}
              className="min-h-12 rounded-lg border-2 border-line-strong bg-raised px-3 text-base text-ink"
            >
              {roles.map((role) => (
                <option key={role} value={role}>
                  {roleLabels[role]}
                </option>
              ))}
            </select>
          </div>
          {person.status === "invited" ? (
            <Button onClick={() => onResend(person)} disabled={resending}>
              {resending ? "Sending…" : "Resend the invitation"}
            </Button>
          ) : person.active ? (
            <Button onClick={() => setPending({ kind: "active", active: false })} disabled={update.isPending}>
              Deactivate
            </Button>
          ) : (
            <Button onClick={() => setPending({ kind: "active", active: true })} disabled={update.isPending}>
              Reactivate
            </Button>
          )}
        </div>
      </div>
      {update.isError && <FieldError id={errorId} message={problemWords(update.error)} />}
      {pending && <ConfirmChange person={person} pending={pending} isMe={isMe} onConfirm={confirm} onCancel={() => setPending(null)} />}
    </li>
  );
}

function dates(person: Person): string {
  if (person.status === "invited") {
    const sent = person.invitedAt ? `Invited ${localDay(person.invitedAt)}` : "Invited";
    return person.inviteExpiresAt && new Date(person.inviteExpiresAt) > new Date() ? `${sent}; the link works until ${localDay(person.inviteExpiresAt)}` : `${sent}; the link has run out, resend it`;
  }
  return person.lastSignInAt ? `Last signed in ${localDayTime(person.lastSignInAt)}` : "Has not signed in yet";
}

function ConfirmChange({ person, pending, isMe, onConfirm, onCancel }: { person: Person; pending: Pending; isMe: boolean; onConfirm: () => void; onCancel: () => void }) {
  const who = isMe ? "you" : person.name;
  const title =
    pending.kind === "role"
      ? `Make ${isMe ? "yourself" : person.name} ${roleLabels[pending.role].toLowerCase()}?`
      : pending.active
        ? `Reactivate ${person.name}?`
        : `Deactivate ${isMe ? "your own account" : person.name}?`;
  const body =
    pending.kind === "role"
      ? person.status === "invited"
        ? `${person.name} will join as ${roleLabels[pending.role].toLowerCase()}.`
        : `This signs ${who} out on every tablet; ${isMe ? "you" : "they"} sign in again with the new role.`
      : pending.active
        ? `${person.name} can sign in again with their old password.`
        : `This signs ${who} out on every tablet at once, and ${isMe ? "you" : "they"} cannot sign in until reactivated. Their sessions and records stay.`;
  return (
    <Dialog title={title} onClose={onCancel}>
      <p className="text-lg">{body}</p>
      <div className="flex flex-wrap justify-end gap-3">
        <Button onClick={onCancel} autoFocus>
          Keep as it is
        </Button>
        <Button variant="primary" onClick={onConfirm}>
          {pending.kind === "role" ? "Change the role" : pending.active ? "Reactivate" : "Deactivate"}
        </Button>
      </div>
    </Dialog>
  );
}
