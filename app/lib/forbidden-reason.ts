import 'server-only';
import { cache } from 'react';

/**
 * Why this request's page was refused, for app/forbidden.tsx to say it: React's `cache` gives one holder per
 * server render, so the reason never leaks between requests. Empty when nothing set it.
 */
export const forbiddenReason = cache((): { message: string; workspaceSlug: string } => ({ message: '', workspaceSlug: '' }));
