import type { ReactNode } from "react";
import { Wordmark } from "../../../components/ui/wordmark.tsx";
import { PageEnter } from "../../../lib/motion.tsx";

/** The plain frame of the pages reached without signing in: the password links and the reset request. */
export function AuthFrame({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b-2 border-line bg-sunken px-8 py-5">
        <Wordmark className="text-2xl" />
      </header>
      <main className="flex flex-1 items-start justify-center px-6 py-10 lg:py-16">
        <PageEnter className="flex w-full max-w-lg flex-col gap-6">{children}</PageEnter>
      </main>
    </div>
  );
}
