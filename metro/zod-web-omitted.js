// Stands in, in the web build, for zod's schema compiler (`z.compile`) and its JSON Schema reader
// (`z.fromJSONSchema`): ~42 KB unminified that every screen would load, as Metro does not drop unused
// exports. The app validates with the ordinary parser and never reads JSON Schema; metro.config.js points
// zod's own imports of those two modules here. Calling either says so rather than failing silently.
function omitted(name) {
  return () => {
    throw new Error(`zod's ${name} is left out of the web build (metro/zod-web-omitted.js)`);
  };
}

export const INVALID = Symbol.for('zod.compile.invalid');
export class ZodCompileAsyncError extends Error {}
export class ZodCompileUnsupportedError extends Error {}
export const compile = omitted('compile');
export const compileFn = omitted('compile');
export const withParser = omitted('withParser');
export const fromJSONSchema = omitted('fromJSONSchema');
