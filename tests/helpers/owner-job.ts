import { afterEach, beforeEach } from 'vitest';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from './server';

/** What each test of a file gets from {@link withOwnerJob}: filled in before the test runs. */
export interface OwnerJob {
  server: TestServer;
  owner: Agent;
  jobId: string;
}

/** Around each test of the file: a fresh test server, a signed-up owner and one job of theirs named `name`. */
export function withOwnerJob(name: string): OwnerJob {
  const world = {} as OwnerJob;
  beforeEach(async () => {
    world.server = await createTestServer();
    world.owner = (await signedUpAgent(world.server.app)).agent;
    world.jobId = (await world.owner.post('/api/jobs').send({ name }).expect(201)).body.id;
  });
  afterEach(() => world.server.close());
  return world;
}
