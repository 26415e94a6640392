import request from 'supertest';
import { SAMPLE_HEADER, SAMPLE_PNG } from './sample-bodies';
import { signedUpAgent, type Agent, type TestServer } from './server';

/** A contracting firm with a job and one member, and an engineer with a confirmed account of their own. */
export async function requestWorld(server: TestServer) {
  const firm = await signedUpAgent(server.app, { firmName: 'Sample Remodeling' });
  const engineer = await signedUpAgent(server.app, {
    firmKind: 'engineering',
    firmName: 'Sample Structural',
  });
  const job = await firm.agent
    .post('/api/jobs')
    .send({ name: 'Kitchen opening (demo)', groundSnowPsf: 30, groundSnowSource: 'County table (demo)' })
    .expect(201);
  const member = await firm.agent
    .post(`/api/jobs/${job.body.id}/members`)
    .send({ label: 'Kitchen header', wall: 'Kitchen/dining', input: SAMPLE_HEADER })
    .expect(201);
  const jobId: string = job.body.id;
  const memberId: string = member.body.id;

  /** A Draft of the job, addressed to `engineerEmail` (the world's engineer by default). */
  async function draft(agent: Agent = firm.agent, engineerEmail = engineer.body.email) {
    const res = await agent
      .post(`/api/jobs/${jobId}/requests`)
      .send({
        memberIds: [memberId],
        engineerEmail,
        jurisdiction: { place: 'Sample Township', state: 'PA' },
        questions: 'Can the beam be flush with the joists?',
      })
      .expect(201);
    return res.body.id as string;
  }

  /** A request sent to the world's engineer; `until` walks it on through the states the engineer sets. */
  async function sent(until: 'sent' | 'in-review' = 'sent') {
    const id = await draft();
    await firm.agent.post(`/api/requests/${id}/send`).expect(200);
    if (until === 'in-review')
      await engineer.agent.post(`/api/requests/${id}/status`).send({ to: 'in-review' }).expect(200);
    return id;
  }

  return { firm, engineer, jobId, memberId, draft, sent };
}

/** Waits for the mailer and answers the captured design request mail to `to`, newest first. */
export async function mailTo(server: TestServer, to: string) {
  return (await server.capturedMail()).filter(
    (mail) => mail.to === to && /^Design request/.test(mail.subject),
  );
}

/** A tiny valid PNG (1 x 1, one grey pixel). */
export const ONE_PIXEL_PNG = SAMPLE_PNG;

export const get = (server: TestServer, path: string, cookie?: string) => {
  const req = request(server.app).get(path);
  return cookie ? req.set('Cookie', cookie) : req;
};
