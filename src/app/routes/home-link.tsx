import { useQuery } from "@tanstack/react-query";
import { Link } from "react-router";
import { buttonClasses } from "../../components/ui/button.tsx";
import { meQueryOptions } from "../../features/auth/api/get-me.ts";
import { homeAreaFor } from "../areas.ts";

/** The way back to the signed-in person's first area. */
export function HomeLink() {
  const { data: me } = useQuery(meQueryOptions());
  const home = me ? homeAreaFor(me.user.role) : null;
  return (
    <Link to={home?.path ?? "/"} className={buttonClasses({ variant: "primary", size: "main" })}>
      {home ? `Go to ${home.label}` : "Go to the first screen"}
    </Link>
  );
}
