import { useNavigate } from "react-router";
import { roleLabels } from "../../../shared/schemas/users.ts";
import type { MeResponse } from "../../../shared/schemas/auth.ts";
import { Button } from "../../components/ui/button.tsx";
import { FormProblem } from "../../components/ui/form-message.tsx";
import { Wordmark } from "../../components/ui/wordmark.tsx";
import { useSignOut } from "../../features/auth/api/sign-out.ts";
import { UnitChoice } from "../../features/auth/components/unit-choice.tsx";
import { ContrastToggle } from "./contrast-toggle.tsx";

export function AppHeader({ me }: { me: MeResponse }) {
  const navigate = useNavigate();
  const signOut = useSignOut();

  const onSignOut = () => {
    if (signOut.isPending) return;
    signOut.mutate(undefined, { onSuccess: () => navigate("/sign-in", { replace: true }) });
  };

  return (
    <header className="border-b-2 border-line bg-raised">
      <div className="flex flex-wrap items-center justify-between gap-x-6 gap-y-3 px-5 py-3">
        <div className="flex min-w-0 items-center gap-4">
          <Wordmark className="text-xl" />
          <span aria-hidden="true" className="h-8 w-0.5 shrink-0 bg-line" />
          <p className="truncate text-lg font-semibold">{me.shop.name}</p>
        </div>
        <div className="ml-auto flex items-center gap-3">
          <p className="flex max-w-56 min-w-0 flex-col text-right leading-tight">
            <span className="truncate font-semibold">{me.user.name}</span>
            <span className="text-base text-ink-muted">{roleLabels[me.user.role]}</span>
          </p>
          <UnitChoice value={me.user.unitSystem} />
          <ContrastToggle />
          <Button onClick={onSignOut} disabled={signOut.isPending}>
            {signOut.isPending ? "Signing out…" : "Sign out"}
          </Button>
        </div>
      </div>
      {signOut.isError && (
        <div className="px-5 pb-3">
          <FormProblem title="You are still signed in.">
            Benchpath could not reach the server to sign you out. Check the connection, then try again.
          </FormProblem>
        </div>
      )}
    </header>
  );
}
