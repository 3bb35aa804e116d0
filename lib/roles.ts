/** Membership roles, weakest first: each role can do everything the ones before it can. */
export const ROLES = ['viewer', 'technician', 'owner'] as const;
export type Role = (typeof ROLES)[number];

