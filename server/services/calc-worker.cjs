/* global require, module */
// Entry of a calculation worker thread (piscina): the engine is TypeScript, so the thread registers tsx
// first (it honours tsconfig's `@/` paths), then hands piscina the task functions by name.
require('tsx/cjs/api').register();
module.exports = require('./calc-tasks.ts');
