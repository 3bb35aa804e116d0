/** Bundles `entry` into `outfile` (both relative to the repository) as scripts/server-bundle.mjs does; resolves to the output's path. */
export function bundleServerCode(entry: string, outfile: string): Promise<string>;
