import { useQuery } from "@tanstack/react-query";
import { Navigate, Outlet, useLocation } from "react-router";
import { meQueryOptions } from "../../features/auth/api/get-me.ts";
import { PageEnter } from "../../lib/motion.tsx";
import { signInPathFor } from "../../lib/next-path.ts";
import { AppHeader } from "./app-header.tsx";
import { AreaNav } from "./area-nav.tsx";

export function AppShell() {
  const { data: me } = useQuery(meQueryOptions());
  const location = useLocation();

  // The session can end while the shell is open (expiry, sign-out elsewhere).
  if (!me) return <Navigate to={signInPathFor(location)} replace />;

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-10 focus:rounded-lg focus:bg-raised focus:px-4 focus:py-3"
      >
        Skip to the page
      </a>
      <AppHeader me={me} />
      <div className="flex flex-1 flex-col lg:flex-row">
        <AreaNav role={me.user.role} />
        <main id="main" tabIndex={-1} className="min-w-0 flex-1 px-6 py-8 lg:px-10">
          <PageEnter key={location.pathname}>
            <Outlet />
          </PageEnter>
        </main>
      </div>
    </div>
  );
}
