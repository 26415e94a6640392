// Stands in for zod's `locales` namespace in the web build: only the English messages, which zod itself
// registers as its default. The full namespace (every language, ~280 KB unminified) would otherwise ride in
// the common chunk every screen loads, as Metro does not drop unused exports. Nothing in the app reads
// `z.locales`; metro.config.js points zod's own import of the namespace here.
export { default as en } from 'zod/v4/locales/en.js';
