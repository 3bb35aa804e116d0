import { ROLES, type Role } from './roles';

/**
 * Who may do what in a workspace: every named action and the roles granted it, in one table.
 * Route handlers, pages, components and the authorization-matrix test ask `can(role, action)`;
 * nothing else compares role names.
 */
const POLICY = {
  'workspace.read': ['viewer', 'technician', 'owner'],
  'workspace.leave': ['viewer', 'technician', 'owner'],
  'workspace.settings': ['owner'],
  'members.read': ['viewer', 'technician', 'owner'],
  'members.manage': ['owner'],
  'invitations.manage': ['owner'],
  'sheet.print': ['viewer', 'technician', 'owner'],
  'printer-profile.read': ['viewer', 'technician', 'owner'],
  'printer-profile.edit': ['technician', 'owner'],
  'printer-profile.set-default': ['owner'],
  'template.read': ['viewer', 'technician', 'owner'],
  'template.edit': ['technician', 'owner'],
  'template.import': ['technician', 'owner'],
  'template.delete': ['owner'],
  'build.read': ['viewer', 'technician', 'owner'],
  'build.edit': ['technician', 'owner'],
  'build.send': ['technician', 'owner'],
  'build.reopen-handed-over': ['owner'],
  'build.delete': ['owner'],
  'activity.read': ['viewer', 'technician', 'owner'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof POLICY;
export const ACTIONS = Object.keys(POLICY) as Action[];

export function can(role: Role, action: Action): boolean {
  return (POLICY[action] as readonly Role[]).includes(role);
}

/** The weakest role granted an action: the policy only ever grants a role and everything above it. */
export function weakestRoleFor(action: Action): Role {
  const role = ROLES.find((r) => can(r, action));
  if (!role) throw new Error(`No role may ${action}`);
  return role;
}
