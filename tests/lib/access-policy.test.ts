import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ACTIONS, can, weakestRoleFor } from '@/lib/access-policy';
import { ROLES } from '@/lib/roles';

describe('the role policy', () => {
  it('grants every action to a role and everything above it, never to a role alone', () => {
    for (const action of ACTIONS) {
      const granted = ROLES.map((role) => can(role, action));
      const first = granted.indexOf(true);
      expect(first, action).toBeGreaterThanOrEqual(0);
      expect(granted.slice(first).every(Boolean), action).toBe(true);
    }
  });

  it('matches the role table in DEVELOPERS.md for the actions the routes use', () => {
    // Written out from DEVELOPERS.md, "Roles": viewers read and print, technicians also edit
    // templates, profiles and builds, owners also manage members, settings and deletion.
    expect(weakestRoleFor('template.read')).toBe('viewer');
    expect(weakestRoleFor('sheet.print')).toBe('viewer');
    expect(weakestRoleFor('template.edit')).toBe('technician');
    expect(weakestRoleFor('template.import')).toBe('technician');
    expect(weakestRoleFor('printer-profile.edit')).toBe('technician');
    expect(weakestRoleFor('build.send')).toBe('technician');
    expect(weakestRoleFor('template.delete')).toBe('owner');
    expect(weakestRoleFor('members.manage')).toBe('owner');
    expect(weakestRoleFor('workspace.settings')).toBe('owner');
    expect(weakestRoleFor('workspace.audit')).toBe('owner');
  });

  it('lets a viewer print but not edit', () => {
    expect(can('viewer', 'sheet.print')).toBe(true);
    expect(can('viewer', 'template.edit')).toBe(false);
    expect(can('technician', 'template.delete')).toBe(false);
  });

  it('agrees with the role table in DEVELOPERS.md, "Roles", row for row', () => {
    const table = [
      `| action | ${ROLES.join(' | ')} |`,
      `| --- | ${ROLES.map(() => '---').join(' | ')} |`,
      ...ACTIONS.map((action) => `| \`${action}\` | ${ROLES.map((role) => (can(role, action) ? 'yes' : '—')).join(' | ')} |`),
    ].join('\n');
    const guide = readFileSync(path.join(process.cwd(), 'DEVELOPERS.md'), 'utf8');
    const roles = guide.slice(guide.indexOf('## Roles'), guide.indexOf('## Layers'));
    const written = roles.split('\n').filter((line) => line.startsWith('|')).join('\n');
    expect(written, `DEVELOPERS.md, "Roles" should hold this table:\n${table}\n`).toBe(table);
  });
});
