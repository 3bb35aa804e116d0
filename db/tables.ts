/** Table names shared by migrations, seeds and queries. */
export const TABLES = {
  users: 'users',
  workspaces: 'workspaces',
  memberships: 'memberships',
} as const;
