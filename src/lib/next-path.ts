/** Only same-app paths are followed after sign-in, so a link cannot send someone off-site. */
export function safeNextPath(value: string | null | undefined): string | null {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return null;
  if (value === "/sign-in" || value.startsWith("/sign-in?") || value.startsWith("/sign-in/")) return null;
  return value;
}

/** The sign-in address that brings the person back to where they were heading. */
export function signInPathFor(place: { pathname: string; search: string }): string {
  const next = place.pathname + place.search;
  return next === "/" ? "/sign-in" : `/sign-in?next=${encodeURIComponent(next)}`;
}
