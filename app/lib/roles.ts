// The four global roles (brief, "Who uses it"). Team ownership is a membership role, not a global one.
export const ROLES = {
  installer: "installer",
  customer: "customer",
  curator: "curator",
  admin: "admin",
} as const;

export type Role = (typeof ROLES)[keyof typeof ROLES];

export const ROLE_LIST: Role[] = [ROLES.installer, ROLES.customer, ROLES.curator, ROLES.admin];

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLE_LIST as string[]).includes(value);
}
