import { ROLES, type Role } from './roles';

/**
 * Who may do what in a workspace: every named action and the roles granted it, in one table.
 * Route handlers, pages, components and the authorization-matrix test ask `can(role, action)`;
 * nothing else compares role names (DEVELOPERS.md, "Roles").
 */
const POLICY = {
  'workspace.read': ['viewer', 'technician', 'owner'],
  'workspace.leave': ['viewer', 'technician', 'owner'],
  'workspace.settings': ['owner'],
  'workspace.audit': ['owner'],
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

/**
 * The role that holds a workspace: given to whoever creates one, and a workspace always keeps
 * at least one member with it (the last one can neither leave nor be demoted).
 */
export const HOLDING_ROLE: Role = 'owner';

/** The role an invitation form offers first: enough to work on templates and builds, not to manage members. */
export const DEFAULT_INVITE_ROLE: Role = 'technician';

/** What each role may do, as the member list and invite form describe them. */
export const ROLE_OPTIONS: ReadonlyArray<{ value: Role; label: string }> = [
  { value: 'viewer', label: 'Viewer — read and print' },
  { value: 'technician', label: 'Technician — templates, build sheets, printing' },
  { value: 'owner', label: 'Owner — members, settings, everything' },
];
