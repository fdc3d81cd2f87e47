import { config } from 'zod';

/**
 * Turns off zod's compiled parsers for this realm. Zod 4 probes for `new Function` when the first object
 * schema is built (util.allowsEval) and, where it works, compiles parsers with it. Under a CSP without
 * 'unsafe-eval' the probe throws and is caught, but the browser still reports a `script-src` violation
 * on every page load. With `jitless` zod skips the probe and parses with its interpreter.
 * Call it before any schema is built: the web app's first import does (apps/web/src/zod-without-eval.ts).
 */
export function parseWithoutEval(): void {
  config({ jitless: true });
}
