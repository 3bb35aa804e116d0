/**
 * THE authorization table: every route handler (and server action) that checks a session
 * or a workspace role, with the status each kind of caller must get. Append your rows;
 * tests/api/authorization-matrix.test.ts runs every row for every actor against a fresh
 * AccessWorld, and fails if a route file under a `[workspace]` segment, or one that imports
 * app/lib/authz, has an exported method without a row here.
 */
import { issueToken } from '@/db/one-time-tokens';
import { createInvitation } from '@/db/invitations';
import { TABLES } from '@/db/tables';
import { HOLDING_ROLE, type Action } from '@/lib/access-policy';
import type { AccessWorld } from './access-world';
import { guardedBy, type Actor } from './policy-expectations';
import { TEMPLATE_ROUTE_CASES } from '../api/templates-route-cases';
import { BUILD_ROUTE_CASES } from '../api/builds-route-cases';

export { ACTORS, type Actor } from './policy-expectations';
export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export type RouteCall = {
  /** Values of the route's dynamic segments; `workspace` defaults to the world's shop. */
  params?: Record<string, string>;
  body?: unknown;
  /** A body that is not JSON, sent as is with its Content-Type. */
  raw?: { type: string; body: string };
  /** Appended to the URL, e.g. '?q=50'. */
  search?: string;
};

export type RouteCase = {
  /** The route file, from the project root. */
  file: string;
  method: Method;
  /** Set up rows in the fresh world if needed, and say what to send. */
  call?: (world: AccessWorld, actor: Actor) => RouteCall | Promise<RouteCall>;
  /** The policy action a workspace route asks for; its expectations come from the policy (`guardedBy`). */
  action?: Action;
  expected: Record<Actor, number>;
};

export type ActionCase = {
  /** The 'use server' file and the exported action's name. */
  file: string;
  name: string;
  args: (world: AccessWorld, actor: Actor) => unknown[] | Promise<unknown[]>;
  /** 200 for a plain success; an AccessError thrown counts as its status. */
  expected: Record<Actor, number>;
  /** How to read a status from what the action returned (default: `result.status` or 200). */
  statusOf?: (result: unknown) => number;
};

/** Routes outside any workspace answer every caller alike. */
export const sameForAll = (status: number): Record<Actor, number> => ({
  signedOut: status,
  viewer: status,
  technician: status,
  owner: status,
  outsider: status,
});

const userOf = (world: AccessWorld, actor: Actor) => world.users[actor === 'signedOut' ? 'viewer' : actor];

/** The outsider aims at the shop's rows through its own workspace: it must still get 404. */
const ownWorkspaceFor = (world: AccessWorld, actor: Actor) =>
  actor === 'outsider' ? world.otherShop.slug : world.shop.slug;

const V1 = 'app/api/v1';

export const ROUTE_MATRIX: RouteCase[] = [
  // Account: open to anyone, the token or address being the credential.
  {
    file: `${V1}/account/sign-up/route.ts`,
    method: 'POST',
    call: (_w, actor) => ({ body: { name: `New ${actor}`, email: `new-${actor}@world.test`, password: 'a long new password' } }),
    expected: sameForAll(201),
  },
  {
    file: `${V1}/account/verify-email/route.ts`,
    method: 'POST',
    call: async (world, actor) => ({ body: { token: await issueToken('verify-email', userOf(world, actor).id, world.knex) } }),
    expected: sameForAll(200),
  },
  {
    file: `${V1}/account/verify-email/resend/route.ts`,
    method: 'POST',
    expected: { signedOut: 401, viewer: 202, technician: 202, owner: 202, outsider: 202 },
  },
  {
    file: `${V1}/account/sign-out-everywhere/route.ts`,
    method: 'POST',
    expected: { signedOut: 401, viewer: 200, technician: 200, owner: 200, outsider: 200 },
  },
  {
    file: `${V1}/account/password-reset/route.ts`,
    method: 'POST',
    call: (world, actor) => ({ body: { email: userOf(world, actor).email } }),
    expected: sameForAll(202),
  },
  {
    file: `${V1}/account/password-reset/confirm/route.ts`,
    method: 'POST',
    call: async (world, actor) => ({
      body: { token: await issueToken('reset-password', userOf(world, actor).id, world.knex), password: 'another long password' },
    }),
    expected: sameForAll(200),
  },
  {
    file: `${V1}/invitations/accept/route.ts`,
    method: 'POST',
    call: async (world, actor) => {
      const [third] = await world.knex(TABLES.workspaces).insert({ slug: 'third-shop', name: 'Third Shop', kind: 'shop' }).returning('id');
      const user = userOf(world, actor);
      const { token } = await createInvitation({ workspaceId: third.id, email: user.email, role: 'viewer', invitedBy: user.id }, world.knex);
      return { body: { token } };
    },
    expected: { signedOut: 401, viewer: 200, technician: 200, owner: 200, outsider: 200 },
  },

  // Workspaces.
  { file: `${V1}/workspaces/route.ts`, method: 'GET', expected: { signedOut: 401, viewer: 200, technician: 200, owner: 200, outsider: 200 } },
  {
    file: `${V1}/workspaces/route.ts`,
    method: 'POST',
    call: () => ({ body: { name: 'Fresh Shop' } }),
    expected: { signedOut: 401, viewer: 201, technician: 201, owner: 201, outsider: 201 },
  },
  { file: `${V1}/workspaces/[workspace]/route.ts`, method: 'GET', ...guardedBy('workspace.read', 200) },
  {
    file: `${V1}/workspaces/[workspace]/route.ts`,
    method: 'PATCH',
    call: () => ({ body: { name: 'Renamed Shop' } }),
    ...guardedBy('workspace.settings', 200),
  },
  { file: `${V1}/workspaces/[workspace]/members/route.ts`, method: 'GET', ...guardedBy('members.read', 200) },
  {
    file: `${V1}/workspaces/[workspace]/members/[userId]/route.ts`,
    method: 'PATCH',
    call: (world, actor) => ({
      params: { workspace: ownWorkspaceFor(world, actor), userId: String(world.users.technician.id) },
      body: { role: 'viewer' },
    }),
    ...guardedBy('members.manage', 200),
  },
  {
    file: `${V1}/workspaces/[workspace]/members/[userId]/route.ts`,
    method: 'DELETE',
    call: (world, actor) => ({ params: { workspace: ownWorkspaceFor(world, actor), userId: String(world.users.viewer.id) } }),
    ...guardedBy('members.manage', 204),
  },
  // The shop has one member holding it, so that member's leaving is refused with 409.
  { file: `${V1}/workspaces/[workspace]/leave/route.ts`, method: 'POST', ...guardedBy('workspace.leave', 204, { [HOLDING_ROLE]: 409 }) },
  { file: `${V1}/workspaces/[workspace]/invitations/route.ts`, method: 'GET', ...guardedBy('invitations.manage', 200) },
  {
    file: `${V1}/workspaces/[workspace]/invitations/route.ts`,
    method: 'POST',
    call: () => ({ body: { email: 'invitee@world.test', role: 'technician' } }),
    ...guardedBy('invitations.manage', 201),
  },
  {
    file: `${V1}/workspaces/[workspace]/invitations/[invitationId]/route.ts`,
    method: 'DELETE',
    call: async (world, actor) => {
      const { id } = await createInvitation(
        { workspaceId: world.shop.id, email: 'pending@world.test', role: 'viewer', invitedBy: world.users.owner.id },
        world.knex,
      );
      return { params: { workspace: ownWorkspaceFor(world, actor), invitationId: String(id) } };
    },
    ...guardedBy('invitations.manage', 204),
  },

  // Printer profiles.
  { file: `${V1}/workspaces/[workspace]/printer-profiles/route.ts`, method: 'GET', ...guardedBy('printer-profile.read', 200) },
  {
    file: `${V1}/workspaces/[workspace]/printer-profiles/route.ts`,
    method: 'POST',
    call: () => ({ body: { name: 'Back office laser', printerScaleX: 0.995, printerScaleY: 1.002 } }),
    ...guardedBy('printer-profile.edit', 201),
  },
  {
    file: `${V1}/workspaces/[workspace]/printer-profiles/[profileId]/route.ts`,
    method: 'DELETE',
    call: async (world, actor) => {
      const [row] = await world.knex(TABLES.printerProfiles)
        .insert({ workspace_id: world.shop.id, name: 'Shop inkjet', scale_x: 1, scale_y: 1, profile_json: '{}' })
        .returning('id');
      return { params: { workspace: ownWorkspaceFor(world, actor), profileId: String(row.id) } };
    },
    ...guardedBy('printer-profile.edit', 204),
  },
  { file: `${V1}/workspaces/[workspace]/build-settings/route.ts`, method: 'GET', ...guardedBy('build.read', 200) },
  {
    file: `${V1}/workspaces/[workspace]/build-settings/route.ts`,
    method: 'PUT',
    call: () => ({ body: { toleranceDeg: 1.5 } }),
    ...guardedBy('workspace.settings', 200),
  },
  { file: `${V1}/workspaces/[workspace]/printer-profiles/default/route.ts`, method: 'GET', ...guardedBy('printer-profile.read', 200) },
  {
    file: `${V1}/workspaces/[workspace]/printer-profiles/default/route.ts`,
    method: 'PUT',
    call: () => ({ body: { profileId: null } }),
    ...guardedBy('printer-profile.set-default', 200),
  },

  // Template library (issue 6).
  ...TEMPLATE_ROUTE_CASES,

  // Build records (issue 9).
  ...BUILD_ROUTE_CASES,
];

/** Server actions that check the session; empty while every write goes through a route handler. */
export const ACTION_MATRIX: ActionCase[] = [];
