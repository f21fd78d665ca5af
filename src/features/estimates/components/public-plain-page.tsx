import type { ReactNode } from "react";

/** A page with one message for the customer: a thank-you, or why the link does not open. */
export function PublicPlainPage({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <main className="mx-auto flex w-full max-w-xl flex-col gap-4 px-4 py-10 text-lg">
      <h1 className="text-step font-semibold">{title}</h1>
      {children}
    </main>
  );
}
