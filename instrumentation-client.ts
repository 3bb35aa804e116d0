/**
 * Runs in the browser before the app's own modules (Next's client instrumentation hook).
 * Zod builds fast object parsers with `new Function` and, when a schema is created, probes
 * whether it may; under the pages' Content-Security-Policy (no 'unsafe-eval') the browser
 * reports that probe as a violation even though Zod catches it. Its documented `jitless`
 * setting skips both; it must be in place before the first schema is built, so it goes
 * through the global Zod reads when it loads.
 */
const zodGlobal = globalThis as { __zod_globalConfig?: Record<string, unknown> };
zodGlobal.__zod_globalConfig = { ...zodGlobal.__zod_globalConfig, jitless: true };
