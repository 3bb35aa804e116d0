import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { workspacePageOf } from '@/app/lib/page-actions';

/** Every page.tsx under app/w, as a path with its dynamic segments filled in. */
function workspacePages(dir = path.join(process.cwd(), 'app', 'w')): Array<{ file: string; samplePath: string }> {
  const found: Array<{ file: string; samplePath: string }> = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) found.push(...workspacePages(full));
    else if (entry.name === 'page.tsx') {
      const route = path.relative(path.join(process.cwd(), 'app'), dir).split(path.sep);
      const samplePath = '/' + route.map((s) => (s === '[workspace]' ? 'harbour-lane' : s === '[id]' ? '17' : s)).join('/');
      found.push({ file: path.relative(process.cwd(), full), samplePath });
    }
  }
  return found;
}

describe('workspacePageOf', () => {
  it('gives the action each kind of page needs, the specific routes before the record routes', () => {
    expect(workspacePageOf('/w/harbour-lane')).toEqual({ workspaceSlug: 'harbour-lane', action: 'workspace.read' });
    expect(workspacePageOf('/w/harbour-lane/templates/new')?.action).toBe('template.edit');
    expect(workspacePageOf('/w/harbour-lane/templates/import')?.action).toBe('template.import');
    expect(workspacePageOf('/w/harbour-lane/templates/17')?.action).toBe('template.read');
    expect(workspacePageOf('/w/harbour-lane/templates/17/edit')?.action).toBe('template.edit');
    expect(workspacePageOf('/w/harbour-lane/builds/new')?.action).toBe('build.edit');
    expect(workspacePageOf('/w/harbour-lane/builds/3/edit/')?.action).toBe('build.edit');
    expect(workspacePageOf('/w/harbour-lane/builds?q=piston')?.action).toBe('build.read');
  });

  it('reads an escaped slug as the page params give it, and knows no other path', () => {
    expect(workspacePageOf('/w/harbour%2Dlane/templates')?.workspaceSlug).toBe('harbour-lane');
    expect(workspacePageOf('/w/bad%E0/templates')?.workspaceSlug).toBe('bad%E0');
    expect(workspacePageOf('/')).toBeUndefined();
    expect(workspacePageOf('/account')).toBeUndefined();
    expect(workspacePageOf('/w/harbour-lane/templates/17/edit/more')).toBeUndefined();
  });

  it('has a rule for every workspace page, and each page checks its access through it', () => {
    const pages = workspacePages();
    expect(pages.length).toBeGreaterThanOrEqual(10);
    for (const { file, samplePath } of pages) {
      expect(workspacePageOf(samplePath), `${file} (${samplePath})`).toBeDefined();
      expect(readFileSync(file, 'utf8'), file).toMatch(/await pageAction\(`\/w\/\$\{slug\}/);
    }
  });
});
