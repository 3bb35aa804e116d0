/** The request header proxy.ts sets to the page's path, for the 403 page to say what was refused. */
export const PAGE_PATH_HEADER = 'x-rimscale-page-path';
