// Navigation per role. Only sections that exist are listed; later sections add their entry here.
import type { Role } from "./roles";

export interface NavItem {
  label: string;
  to: string;
  roles: Role[];
}

export const NAV_ITEMS: NavItem[] = [
  { label: "Catalogue", to: "/catalogue", roles: ["installer", "curator", "admin"] },
  { label: "Site yield", to: "/yield", roles: ["installer", "curator", "admin"] },
  { label: "Field readings", to: "/readings", roles: ["installer"] },
  { label: "Review", to: "/review", roles: ["curator"] },
  { label: "Sites", to: "/sites", roles: ["installer"] },
  { label: "Kit plans", to: "/plans", roles: ["installer"] },
  { label: "Sourcing", to: "/sourcing", roles: ["installer"] },
  { label: "Quotes", to: "/quotes", roles: ["installer"] },
  { label: "Your quotes", to: "/my-quotes", roles: ["customer"] },
  { label: "Team", to: "/team", roles: ["installer"] },
  { label: "Users", to: "/admin/users", roles: ["admin"] },
];

export function navFor(role: Role | null) {
  return role ? NAV_ITEMS.filter((item) => item.roles.includes(role)) : [];
}
