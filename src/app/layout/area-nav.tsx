import { NavLink } from "react-router";
import type { Role } from "../../../shared/schemas/users.ts";
import { areasFor } from "../areas.ts";

const linkBase =
  "flex min-h-12 items-center gap-3 rounded-lg border-2 px-4 text-base font-medium whitespace-nowrap";

export function AreaNav({ role }: { role: Role }) {
  return (
    <nav aria-label="Areas" className="border-b-2 border-line bg-sunken lg:w-60 lg:shrink-0 lg:border-r-2 lg:border-b-0">
      <ul className="flex gap-2 overflow-x-auto px-4 py-2 lg:flex-col lg:px-3 lg:py-4">
        {areasFor(role).map((area) => (
          <li key={area.id}>
            <NavLink
              to={area.path}
              className={({ isActive }) =>
                `${linkBase} ${isActive ? "border-accent bg-accent font-semibold text-accent-ink" : "border-line-strong bg-raised text-ink"}`
              }
            >
              {({ isActive }) => (
                <>
                  {/* The current area is marked by a bar as well as by colour; in the rail, labels stay aligned. */}
                  <span
                    aria-hidden="true"
                    className={`h-6 w-1.5 shrink-0 rounded-full ${isActive ? "bg-accent-ink" : "hidden bg-transparent lg:block"}`}
                  />
                  {area.label}
                </>
              )}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
