/** The node flags `npm start` gives scripts/server.mjs, as scripts/start-flags.mjs reads them from package.json. */
export function startNodeFlags(): string[];
