import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('.', import.meta.url)) } },
  test: {
    include: ['tests/**/*.test.ts'],
    environment: 'node',
    pool: 'forks',
    testTimeout: 20000,
    // A set-up that saves a member waits for the calculation pool's first thread to load the engine, which
    // takes seconds on a busy machine.
    hookTimeout: 60000,
  },
});
