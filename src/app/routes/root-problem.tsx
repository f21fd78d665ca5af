import { useRouteError } from "react-router";
import { Wordmark } from "../../components/ui/wordmark.tsx";
import { ScreenProblem } from "./route-problem.tsx";

/** When Benchpath cannot start at all, e.g. the server is down as the tablet wakes up. */
export function RootProblem() {
  const error = useRouteError();
  return (
    <div className="flex min-h-dvh flex-col gap-10 px-8 py-8">
      <Wordmark className="text-2xl" />
      <main>
        <ScreenProblem error={error} />
      </main>
    </div>
  );
}

export function StartingUp() {
  return (
    <div className="flex min-h-dvh flex-col gap-10 px-8 py-8">
      <Wordmark className="text-2xl" />
      <p role="status" className="text-ink-muted">
        Opening Benchpath…
      </p>
    </div>
  );
}
