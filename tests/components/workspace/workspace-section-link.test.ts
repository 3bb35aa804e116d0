import { describe, expect, it } from 'vitest';
import { workspaceForLink } from '@/components/workspace/workspace-section-link';

const workspaces = [
  { slug: 'me', kind: 'personal' as const },
  { slug: 'north-shop', kind: 'shop' as const },
  { slug: 'south-shop', kind: 'shop' as const },
];

describe('workspaceForLink', () => {
  it('stays in the workspace of the URL', () => {
    expect(workspaceForLink('/w/south-shop/builds/4', workspaces)).toBe('south-shop');
  });

  it('leads to the first shop outside a workspace, or to a workspace the member is not in', () => {
    expect(workspaceForLink('/calculators', workspaces)).toBe('north-shop');
    expect(workspaceForLink('/w/elsewhere/templates', workspaces)).toBe('north-shop');
  });

  it('falls back to the personal workspace, and to nothing without one', () => {
    expect(workspaceForLink('/', [workspaces[0]!])).toBe('me');
    expect(workspaceForLink('/', [])).toBeUndefined();
  });
});
