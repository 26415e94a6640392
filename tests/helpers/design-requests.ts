import request from 'supertest';
import { SAMPLE_HEADER, SAMPLE_PNG } from './sample-bodies';
import { signedUpAgent, type Agent, type TestServer } from './server';

/**
 * A contracting firm with a job and one member, and an engineer with a confirmed account of their own;
 * `names` gives the contractor and the job other names.
 */
export async function requestWorld(
  server: TestServer,
  names: { contractorName?: string; jobName?: string } = {},
) {
  const firm = await signedUpAgent(server.app, {
    firmName: 'Sample Remodeling',
    ...(names.contractorName ? { name: names.contractorName } : {}),
  });
  const engineer = await signedUpAgent(server.app, {
    firmKind: 'engineering',
    firmName: 'Sample Structural',
  });
  const job = await firm.agent
    .post('/api/jobs')
    .send({
      name: names.jobName ?? 'Kitchen opening (demo)',
      groundSnowPsf: 30,
      groundSnowSource: 'County table (demo)',
    })
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

  /** The engineer's reply to the current version: `reply` (default: a 2-ply 1-3/4 x 9-1/4 LVL, invented). */
  async function reply(id: string, body: Record<string, unknown> = sampleReply(memberId)) {
    await engineer.agent.post(`/api/requests/${id}/reply`).send(body).expect(201);
  }

  /** A request in review walked to Designed: fee quoted and accepted, `body` replied, a design document. */
  async function designed(id: string, body: Record<string, unknown> = sampleReply(memberId)) {
    await engineer.agent
      .post(`/api/requests/${id}/fee`)
      .send({ feeUsd: 650, turnaroundDays: 5, siteVisit: false })
      .expect(200);
    await firm.agent.post(`/api/requests/${id}/fee/accept`).expect(200);
    await reply(id, body);
    await engineer.agent
      .post(`/api/requests/${id}/attachments`)
      .field('purpose', 'design')
      .attach('file', SAMPLE_PNG, 'design.png')
      .expect(201);
    await engineer.agent.post(`/api/requests/${id}/status`).send({ to: 'designed' }).expect(200);
  }

  return { firm, engineer, jobId, memberId, draft, sent, reply, designed };
}

/** An invented engineer's reply designing `memberId` as a 2-ply 1-3/4 x 9-1/4 LVL, with two field items. */
export const sampleReply = (memberId: string) => ({
  members: [
    {
      memberId,
      material: 'lvl',
      designation: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
      plies: 2,
      widthIn: 3.5,
      depthIn: 9.25,
      plyFastening: '2 rows 16d at 12 in',
    },
  ],
  verifyInField: [
    { item: 'Joist size and spacing over the opening', photo: true },
    { item: 'Jack studs bear on the subfloor, not on finish flooring', photo: false },
  ],
});

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
