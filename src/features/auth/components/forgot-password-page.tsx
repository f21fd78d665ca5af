import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Link } from "react-router";
import type { z } from "zod";
import { passwordResetRequestSchema } from "../../../../shared/schemas/people.ts";
import { Button, buttonClasses } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useRequestReset } from "../api/request-reset.ts";
import { invalidInputDetails, waitSentence } from "../lib/sign-in-problem.ts";
import { AuthFrame } from "./auth-frame.tsx";

type Fields = z.input<typeof passwordResetRequestSchema>;
type Values = z.output<typeof passwordResetRequestSchema>;

/** /forgot-password: asks for a reset link; the answer is the same whether or not the address is known. */
export function ForgotPasswordPage() {
  const reset = useRequestReset();
  const {
    register,
    handleSubmit,
    setError,
    getValues,
    formState: { errors },
  } = useForm<Fields, unknown, Values>({ resolver: zodResolver(passwordResetRequestSchema), defaultValues: { email: "" } });

  const onSubmit = handleSubmit(async (values) => {
    if (reset.isPending) return;
    try {
      await reset.mutateAsync(values);
    } catch (error) {
      const message = isApiRequestError(error, "invalid_input") ? invalidInputDetails(error.details).fieldErrors.email?.[0] : undefined;
      if (message) setError("email", { message });
    }
  });

  if (reset.isSuccess)
    return (
      <AuthFrame>
        <section aria-labelledby="reset-sent" className="flex flex-col gap-5">
          <h1 id="reset-sent" className="text-step font-semibold">
            Check your e-mail
          </h1>
          <p className="text-lg">If that address belongs to someone here, a link is on its way to {getValues("email").trim().toLowerCase()}. It works once, for an hour.</p>
          <p className="text-ink-muted">Nothing after a few minutes? Look in the junk folder, or ask your shop lead.</p>
          <Link to="/sign-in" className={`${buttonClasses()} self-start`}>
            Back to sign-in
          </Link>
        </section>
      </AuthFrame>
    );

  const problem = reset.error && !isApiRequestError(reset.error, "invalid_input") ? reset.error : null;
  return (
    <AuthFrame>
      <form onSubmit={onSubmit} noValidate aria-labelledby="forgot-title" className="flex flex-col gap-6">
        <div className="flex flex-col gap-2">
          <h1 id="forgot-title" className="text-step font-semibold">
            Forgot your password?
          </h1>
          <p className="text-lg">Give the e-mail address you sign in with, and Benchpath sends a link to choose a new password.</p>
        </div>
        {problem &&
          (isApiRequestError(problem, "too_many_attempts") ? (
            <FormProblem title="Too many requests for a link.">{waitSentence(problem.retryAfter)}</FormProblem>
          ) : (
            <FormProblem title="The request did not reach the shop's server.">Check the connection and try again.</FormProblem>
          ))}
        <TextField id="reset-email" label="E-mail" type="email" inputMode="email" autoComplete="username" autoCapitalize="none" autoCorrect="off" spellCheck={false} error={errors.email?.message} {...register("email")} />
        <Button type="submit" variant="primary" size="main" disabled={reset.isPending} className="w-full">
          {reset.isPending ? "Sending…" : "Send me a link"}
        </Button>
        <Link to="/sign-in" className={`${buttonClasses({ variant: "quiet" })} self-start`}>
          Back to sign-in
        </Link>
      </form>
    </AuthFrame>
  );
}
