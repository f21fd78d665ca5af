import { useQuery } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Link } from "react-router";
import type { z } from "zod";
import { newPasswordFormSchema, type PasswordLink } from "../../../../shared/schemas/people.ts";
import { Button, buttonClasses } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { passwordLinkQueryOptions, usePasswordLink } from "../api/password-link.ts";
import { invalidInputDetails } from "../lib/sign-in-problem.ts";
import { AuthFrame } from "./auth-frame.tsx";
import { PasswordInput } from "./password-input.tsx";

type Fields = z.input<typeof newPasswordFormSchema>;

/** /welcome/:token and /reset-password/:token: choose a password with a one-time link from an e-mail. */
export function PasswordLinkPage({ token }: { token: string }) {
  const link = useQuery(passwordLinkQueryOptions(token));
  return <AuthFrame>{link.isPending ? <p className="text-lg text-ink-muted">Checking the link…</p> : link.isError ? <LinkProblem error={link.error} /> : <ChoosePassword token={token} link={link.data} />}</AuthFrame>;
}

const goneTitles: Record<string, string> = {
  link_used: "This link has already been used",
  link_expired: "This link no longer works",
  account_inactive: "This account is not active",
  not_found: "Benchpath does not know this link",
};

function LinkProblem({ error }: { error: unknown }) {
  const known = isApiRequestError(error) && (error.status === 404 || error.status === 410);
  if (!known)
    return (
      <>
        <h1 className="text-step font-semibold">The link could not be checked</h1>
        <FormProblem title="Benchpath cannot reach the shop's server.">Check the connection, then reload this page. The link has not been used.</FormProblem>
      </>
    );
  return (
    <section aria-labelledby="link-problem" className="flex flex-col gap-5">
      <h1 id="link-problem" className="text-step font-semibold">
        {goneTitles[error.id] ?? goneTitles.not_found}
      </h1>
      <p className="text-lg">{error.message}</p>
      <p className="text-ink-muted">An invitation can be sent again by your shop lead. A reset link can be asked for again from the sign-in page.</p>
      <div className="flex flex-wrap gap-3">
        <Link to="/sign-in" className={buttonClasses({ variant: "primary" })}>
          Go to sign-in
        </Link>
        <Link to="/forgot-password" className={buttonClasses()}>
          Ask for a new reset link
        </Link>
      </div>
    </section>
  );
}

function ChoosePassword({ token, link }: { token: string; link: PasswordLink }) {
  const setPassword = usePasswordLink(token);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<Fields>({ resolver: zodResolver(newPasswordFormSchema), defaultValues: { password: "", confirm: "" } });

  const onSubmit = handleSubmit(async ({ password }) => {
    if (setPassword.isPending) return;
    try {
      await setPassword.mutateAsync({ password });
    } catch (error) {
      const message = isApiRequestError(error, "invalid_input") ? invalidInputDetails(error.details).fieldErrors.password?.[0] : undefined;
      if (message) setError("password", { message });
    }
  });

  const invite = link.purpose === "invite";
  if (setPassword.isSuccess)
    return (
      <section aria-labelledby="password-set" className="flex flex-col gap-5">
        <h1 id="password-set" className="text-step font-semibold">
          Your password is set
        </h1>
        <p className="text-lg">
          {invite ? "You have joined the shop on Benchpath. Sign in with your e-mail address and the password you just chose." : "Sign in with your new password. Anywhere you were still signed in has been signed out."}
        </p>
        <p className="text-ink-muted">Signing in as {setPassword.data.email}.</p>
        <Link to="/sign-in" className={`${buttonClasses({ variant: "primary", size: "main" })} self-start`}>
          Sign in
        </Link>
      </section>
    );

  const gone = setPassword.error && isApiRequestError(setPassword.error) && (setPassword.error.status === 410 || setPassword.error.status === 404);
  if (gone) return <LinkProblem error={setPassword.error} />;
  const otherProblem = setPassword.error && !isApiRequestError(setPassword.error, "invalid_input");

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="choose-title" className="flex flex-col gap-6">
      <div className="flex flex-col gap-2">
        <h1 id="choose-title" className="text-step font-semibold">
          {invite ? `Welcome, ${link.name}` : `A new password for ${link.name}`}
        </h1>
        <p className="text-lg">{invite ? "Choose a password to join your shop on Benchpath." : "Choose a new password. Using it signs you out everywhere else."}</p>
      </div>
      {otherProblem && <FormProblem title="The password was not saved.">Benchpath could not reach the shop's server. Check the connection and try again; the link still works.</FormProblem>}
      <PasswordInput id="new-password" label="New password" hint="At least 12 characters. A few unrelated words work well." autoComplete="new-password" autoCapitalize="none" autoCorrect="off" spellCheck={false} error={errors.password?.message} {...register("password")} />
      <PasswordInput id="confirm-password" label="The same password again" autoComplete="new-password" autoCapitalize="none" autoCorrect="off" spellCheck={false} error={errors.confirm?.message} {...register("confirm")} />
      <Button type="submit" variant="primary" size="main" disabled={setPassword.isPending} className="w-full">
        {setPassword.isPending ? "Saving…" : invite ? "Join the shop" : "Save the new password"}
      </Button>
    </form>
  );
}
