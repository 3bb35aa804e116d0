import type { Action } from '@/lib/access-policy';

/**
 * What each workspace page needs, by its path: the page checks it (pageAction) and the 403 page
 * says it (app/forbidden.tsx). One table, because the 403 page is rendered beside the page, not
 * after it, and so cannot be told by the page what was refused; it works it out again from the path.
 * More specific routes come first (`templates/new` before `templates/[id]`).
 */
const PAGE_ACTIONS: ReadonlyArray<readonly [RegExp, Action]> = [
  [/^\/w\/([^/]+)$/, 'workspace.read'],
  [/^\/w\/([^/]+)\/templates$/, 'template.read'],
  [/^\/w\/([^/]+)\/templates\/new$/, 'template.edit'],
  [/^\/w\/([^/]+)\/templates\/import$/, 'template.import'],
  [/^\/w\/([^/]+)\/templates\/[^/]+\/edit$/, 'template.edit'],
  [/^\/w\/([^/]+)\/templates\/[^/]+$/, 'template.read'],
  [/^\/w\/([^/]+)\/builds$/, 'build.read'],
  [/^\/w\/([^/]+)\/builds\/new$/, 'build.edit'],
  [/^\/w\/([^/]+)\/builds\/[^/]+\/edit$/, 'build.edit'],
  [/^\/w\/([^/]+)\/builds\/[^/]+$/, 'build.read'],
];

/** A path segment as the page's params give it (a malformed escape is kept as it is). */
function decodedSegment(segment: string): string {
  try {
    return decodeURIComponent(segment);
  } catch {
    return segment;
  }
}

export type WorkspacePage = { workspaceSlug: string; action: Action };

/** The workspace and the action a page path needs, or undefined for a path that is no workspace page. */
export function workspacePageOf(pathname: string): WorkspacePage | undefined {
  const path = pathname.split(/[?#]/)[0]!.replace(/\/+$/, '');
  for (const [pattern, action] of PAGE_ACTIONS) {
    const match = pattern.exec(path);
    if (match) return { workspaceSlug: decodedSegment(match[1]!), action };
  }
  return undefined;
}
