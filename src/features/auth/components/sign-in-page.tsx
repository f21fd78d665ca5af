import type { MeResponse } from "../../../../shared/schemas/auth.ts";
import { Wordmark } from "../../../components/ui/wordmark.tsx";
import { PageEnter } from "../../../lib/motion.tsx";
import { SignInForm } from "./sign-in-form.tsx";

const firstChecks = ["Spark", "Fuel", "Compression"];
const stepIndent = ["pl-0", "pl-6", "pl-12"];

export function SignInPage({ onSignedIn }: { onSignedIn: (me: MeResponse) => void }) {
  return (
    <div className="grid min-h-dvh grid-rows-[auto_1fr] lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)] lg:grid-rows-1">
      <header className="flex flex-col justify-between gap-6 border-b-2 border-line bg-sunken px-8 py-6 lg:border-r-2 lg:border-b-0 lg:px-12 lg:py-12">
        <Wordmark className="text-3xl" />
        <div className="hidden flex-col gap-5 lg:flex">
          <p className="max-w-[26ch] text-2xl leading-snug font-medium">
            Guided no-start checks for the small-engine bench.
          </p>
          <ol aria-label="Where most checks begin" className="flex flex-col gap-0">
            {firstChecks.map((check, index) => (
              <li key={check} className={`flex items-center gap-3 ${stepIndent[index] ?? ""}`}>
                <span className="flex size-9 items-center justify-center rounded-full border-2 border-accent font-semibold text-accent tabular-figures">
                  {index + 1}
                </span>
                <span className="text-lg text-ink-muted">{check}</span>
              </li>
            ))}
          </ol>
        </div>
        <p className="hidden text-ink-muted lg:block">Ask your shop lead if you do not have an account yet.</p>
      </header>
      <main className="flex items-start justify-center px-6 py-10 lg:items-center lg:px-12">
        <PageEnter className="w-full max-w-md">
          <SignInForm onSignedIn={onSignedIn} />
          <p className="mt-8 text-ink-muted lg:hidden">Ask your shop lead if you do not have an account yet.</p>
        </PageEnter>
      </main>
    </div>
  );
}
