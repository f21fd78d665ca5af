import { useQuery } from "@tanstack/react-query";
import { roleLabels } from "../../../shared/schemas/users.ts";
import { meQueryOptions } from "../../features/auth/api/get-me.ts";
import { areas, roleLabelsFor, type AreaId } from "../areas.ts";
import { HomeLink } from "./home-link.tsx";

export function NotForRole({ area }: { area: AreaId }) {
  const { data: me } = useQuery(meQueryOptions());
  const { label } = areas[area];
  const openTo = joinWithAnd(roleLabelsFor(area).map((name) => `${name.toLowerCase()}s`));
  const role = me?.user.role;
  return (
    <div className="flex max-w-[70ch] flex-col items-start gap-5">
      <h1 className="text-step font-semibold">Not for your role</h1>
      <p>
        The {label} area is open to {openTo}.
        {role && ` You are signed in as ${withArticle(roleLabels[role].toLowerCase())}.`}
        {role && role !== "shop_lead" && " If your work needs it, ask your shop lead."}
      </p>
      <HomeLink />
    </div>
  );
}

function joinWithAnd(items: string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items.at(-1)}`;
}

function withArticle(word: string): string {
  return /^[aeiou]/.test(word) ? `an ${word}` : `a ${word}`;
}
