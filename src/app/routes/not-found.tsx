import { useLocation } from "react-router";
import { HomeLink } from "./home-link.tsx";

export function NotFound() {
  const { pathname } = useLocation();
  return (
    <div className="flex max-w-[70ch] flex-col items-start gap-5">
      <h1 className="text-step font-semibold">No page here</h1>
      <p>
        Nothing in Benchpath lives at <code className="rounded bg-sunken px-1.5 font-mono text-base">{pathname}</code>.
        Check the address, or go back to your first screen.
      </p>
      <HomeLink />
    </div>
  );
}
