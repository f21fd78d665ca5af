import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { inviteRequestSchema, type InviteResponse } from "../../../../shared/schemas/people.ts";
import { roleLabels, roles } from "../../../../shared/schemas/users.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useInvitePerson } from "../api/invite-person.ts";

type Fields = z.input<typeof inviteRequestSchema>;
type Values = z.output<typeof inviteRequestSchema>;
const fieldNames = ["email", "name", "role"] as const;

/** Adds someone to the shop and e-mails them a link to choose their password. */
export function InviteForm({ onInvited }: { onInvited: (result: InviteResponse) => void }) {
  const invite = useInvitePerson();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<Fields, unknown, Values>({ resolver: zodResolver(inviteRequestSchema), defaultValues: { name: "", email: "", role: "apprentice" } });

  const onSubmit = handleSubmit(async (values) => {
    if (invite.isPending) return;
    try {
      const result = await invite.mutateAsync(values);
      reset();
      onInvited(result);
    } catch (error) {
      // A taken address (409) and bad fields (400) both name their field.
      if (!isApiRequestError(error)) return;
      const fieldErrors = (error.details as { fieldErrors?: Record<string, string[]> } | undefined)?.fieldErrors ?? {};
      for (const name of fieldNames) {
        const message = fieldErrors[name]?.[0];
        if (message) setError(name, { message });
      }
    }
  });

  const named = invite.error && isApiRequestError(invite.error) && (invite.error.status === 400 || invite.error.id === "email_taken");
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="invite-title" className="flex flex-col gap-5 rounded-xl border-2 border-line bg-raised px-5 py-5">
      <div className="flex flex-col gap-1">
        <h2 id="invite-title" className="text-2xl font-semibold">
          Invite someone
        </h2>
        <p className="text-ink-muted">They get an e-mail with a link to choose a password. The link works once, for seven days.</p>
      </div>
      {invite.error && !named && <FormProblem title="The invitation was not made.">{isApiRequestError(invite.error) && invite.error.status >= 400 && invite.error.status < 500 ? invite.error.message : "Benchpath could not reach the shop's server. Check the connection and try again; what you typed is kept."}</FormProblem>}
      <div className="grid gap-5 md:grid-cols-2">
        <TextField id="invite-name" label="Name" autoComplete="off" needed error={errors.name?.message} {...register("name")} />
        <TextField id="invite-email" label="E-mail" type="email" inputMode="email" autoComplete="off" autoCapitalize="none" autoCorrect="off" spellCheck={false} needed error={errors.email?.message} {...register("email")} />
        <SelectField id="invite-role" label="Role" needed error={errors.role?.message} {...register("role")}>
          {roles.map((role) => (
            <option key={role} value={role}>
              {roleLabels[role]}
            </option>
          ))}
        </SelectField>
        <Button type="submit" variant="primary" disabled={invite.isPending} className="self-end justify-self-start md:min-h-14">
          {invite.isPending ? "Sending the invitation…" : "Send the invitation"}
        </Button>
      </div>
    </form>
  );
}
