/**
 * Turns off zod's compiled parsers for this realm. Zod 4 probes for `new Function` when the first object
 * schema is built (util.allowsEval) and, where it works, compiles parsers with it. Under a CSP without
 * 'unsafe-eval' the probe throws and is caught, but the browser still reports a `script-src` violation
 * on every page load. With `jitless` zod skips the probe and parses with its interpreter.
 * Call it before any schema is built: the web app's first import does (apps/web/src/zod-without-eval.ts).
 *
 * Zod keeps its settings on `globalThis.__zod_globalConfig`, shared by every copy of zod in a realm, and
 * adopts an object already there when it loads; `config()` answers that object. Setting it directly,
 * rather than importing `config` from zod, keeps zod out of the code that runs first: zod's index
 * re-exports its compiler module, which is marked as having side effects, so importing anything from it
 * puts all of zod (about 100 kB) into the web app's initial bundle. zod-without-eval.spec.ts checks that
 * zod reads this object.
 */
export function parseWithoutEval(): void {
  const realm = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
  (realm.__zod_globalConfig ??= {}).jitless = true;
}
