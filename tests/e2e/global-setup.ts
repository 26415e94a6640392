import type { TestProject } from 'vitest/node';
import { startServer, type RunningServer } from '@/tests/helpers/start-server';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    devMailUrl: string;
  }
}

let server: RunningServer | undefined;

/** Starts the real server on a free loopback port with a throwaway database for the browser tests. */
export async function setup(project: TestProject): Promise<void> {
  server = await startServer();
  project.provide('baseUrl', server.baseUrl);
  project.provide('devMailUrl', server.devMailUrl);
}

export async function teardown(): Promise<void> {
  await server?.stop();
}
