// The four roles of PRODUCT.md and what the client may show each. The server's requireRole middleware is
// the authority; the client uses the same lists only to hide what a role may not use.
export const ROLES = ['admin', 'lead', 'technician', 'user'] as const;
export type Role = (typeof ROLES)[number];

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

/** Roles that may read every site (a `user` sees only their own station). */
export const STAFF: Role[] = ['admin', 'lead', 'technician'];
/** Roles that create and edit sites, stations, profiles and surveys. */
export const EDITORS: Role[] = ['admin', 'technician'];
