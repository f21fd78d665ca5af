import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { signInRequestSchema, type MeResponse } from "../../../../shared/schemas/auth.ts";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { Link } from "react-router";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { useSignIn } from "../api/sign-in.ts";
import { describeSignInProblem, invalidInputDetails } from "../lib/sign-in-problem.ts";
import { PasswordInput } from "./password-input.tsx";

type SignInFields = z.input<typeof signInRequestSchema>;
type SignInValues = z.output<typeof signInRequestSchema>;
const fieldNames = ["email", "password"] as const;

export function SignInForm({ onSignedIn }: { onSignedIn: (me: MeResponse) => void }) {
  const signIn = useSignIn();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<SignInFields, unknown, SignInValues>({
    resolver: zodResolver(signInRequestSchema),
    defaultValues: { email: "", password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    if (signIn.isPending) return;
    try {
      onSignedIn(await signIn.mutateAsync(values));
    } catch (error) {
      if (isApiRequestError(error, "invalid_input")) showFieldErrors(error.details, setError);
    }
  });

  const problem = signIn.error ? describeSignInProblem(signIn.error) : null;

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="sign-in-title" className="flex flex-col gap-6">
      <h1 id="sign-in-title" className="text-step font-semibold">
        Sign in
      </h1>
      {problem && <FormProblem title={problem.title}>{problem.body}</FormProblem>}
      <TextField
        id="email"
        label="E-mail"
        type="email"
        inputMode="email"
        autoComplete="username"
        autoCapitalize="none"
        autoCorrect="off"
        spellCheck={false}
        error={errors.email?.message}
        {...register("email")}
      />
      <PasswordInput
        id="password"
        label="Password"
        autoComplete="current-password"
        autoCapitalize="none"
        autoCorrect="off"
        spellCheck={false}
        error={errors.password?.message}
        {...register("password")}
      />
      <Button type="submit" variant="primary" size="main" disabled={signIn.isPending} className="mt-2 w-full">
        {signIn.isPending ? "Signing in…" : "Sign in"}
      </Button>
      <Link to="/forgot-password" className="self-start text-lg font-semibold text-accent underline decoration-2 underline-offset-4">
        Forgot your password?
      </Link>
    </form>
  );
}

function showFieldErrors(details: unknown, setError: (name: (typeof fieldNames)[number], error: { message: string }) => void) {
  const { fieldErrors } = invalidInputDetails(details);
  for (const name of fieldNames) {
    const message = fieldErrors[name]?.[0];
    if (message) setError(name, { message });
  }
}
