import { config } from 'zod';

/**
 * zod 4 compiles object parsers with `new Function` unless told not to, and
 * probes for it when the first schema is made: under the API's
 * Content-Security-Policy (no 'unsafe-eval') the probe is a CSP violation in
 * every page. Jitless parsing needs no eval. Imported first in main.tsx,
 * before any module (the engine's among them) makes a schema.
 */
config({ jitless: true });
