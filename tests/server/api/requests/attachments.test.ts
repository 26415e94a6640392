import { createHash } from 'node:crypto';
import { readdirSync } from 'node:fs';
import { PDFDocument } from 'pdf-lib';
import sharp from 'sharp';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { attachments, auditEvents } from '@/db/schema';
import { HEIC_NOTE } from '@/server/api/requests/request-detail';
import { MAX_UPLOAD_BYTES } from '@/server/services/uploads/sniff-type';
import { requestFileSchema } from '@/shared/schemas/requests/views';
import { ONE_PIXEL_PNG, requestWorld } from '@/tests/helpers/design-requests';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let world: Awaited<ReturnType<typeof requestWorld>>;
beforeEach(async () => {
  server = await createTestServer();
  world = await requestWorld(server);
});
afterEach(() => server.close());

/** Every file under the storage folder. */
const storedFiles = () =>
  readdirSync(server.storageDir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile());
const rows = () => server.db.select().from(attachments).all();

function upload(
  agent: Agent,
  requestId: string,
  bytes: Buffer,
  name: string,
  fields: Record<string, string> = {
    place: 'attic-over-wall',
    caption: 'Joists over the wall, tape at 16 in',
  },
) {
  const req = agent.post(`/api/requests/${requestId}/attachments`);
  for (const [key, value] of Object.entries(fields)) req.field(key, value);
  return req.attach('file', bytes, { filename: name, contentType: 'image/jpeg' });
}

/** The first bytes of a HEIF still with the `heic` brand (an ISO-BMFF `ftyp` box), as a phone writes it. */
const HEIC_HEAD = Buffer.concat([
  Buffer.from([0, 0, 0, 0x18]),
  Buffer.from('ftypheic', 'latin1'),
  Buffer.from([0, 0, 0, 0]),
  Buffer.from('mif1heic', 'latin1'),
  Buffer.alloc(64),
]);

describe('uploads', () => {
  it('stores a photo under a random key with its SHA-256, tagged and captioned, and serves it back', async () => {
    const id = await world.draft();
    const res = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'attic.png').expect(201);
    const file = requestFileSchema.parse(res.body);
    expect(file).toMatchObject({
      place: 'attic-over-wall',
      caption: 'Joists over the wall, tape at 16 in',
      mimeType: 'image/png',
      sizeBytes: ONE_PIXEL_PNG.length,
      sha256: createHash('sha256').update(ONE_PIXEL_PNG).digest('hex'),
      hasPreview: false,
      widthPx: 1,
    });
    const [stored] = storedFiles();
    expect(stored.name).toMatch(/^[0-9a-f]{32}\.bin$/);
    expect(stored.name).not.toContain('attic');
    const back = await world.firm.agent
      .get(`/api/requests/${id}/attachments/${file.id}`)
      .buffer(true)
      .expect(200);
    expect(Buffer.compare(back.body as Buffer, ONE_PIXEL_PNG)).toBe(0);
    expect(back.headers['content-disposition']).toBe('attachment; filename="attic.png"');
    const actions = server.db
      .select()
      .from(auditEvents)
      .all()
      .map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['request.upload', 'request.download']));
  });

  it('judges the type by content: a PNG named .pdf is a PNG', async () => {
    const id = await world.draft();
    const res = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'plan.pdf').expect(201);
    expect(res.body.mimeType).toBe('image/png');
  });

  it('makes a downscaled copy of a large photo and keeps the original', async () => {
    const id = await world.draft();
    const big = await sharp({ create: { width: 2400, height: 1800, channels: 3, background: '#7a6a55' } })
      .jpeg()
      .toBuffer();
    const res = await upload(world.firm.agent, id, big, 'ridge.jpg', {
      place: 'ridge',
      caption: 'Ridge board',
    }).expect(201);
    expect(res.body).toMatchObject({
      hasPreview: true,
      widthPx: 2400,
      heightPx: 1800,
      mimeType: 'image/jpeg',
    });
    const preview = await world.firm.agent
      .get(`/api/requests/${id}/attachments/${res.body.id}?size=preview`)
      .buffer(true)
      .expect(200);
    const meta = await sharp(preview.body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([1600, 1200]);
    const original = await world.firm.agent
      .get(`/api/requests/${id}/attachments/${res.body.id}`)
      .buffer(true)
      .expect(200);
    expect((original.body as Buffer).length).toBe(big.length);
    expect(storedFiles()).toHaveLength(2);
  });

  it('keeps a HEIC photo as sent and says why there is no smaller copy', async () => {
    const id = await world.draft();
    const res = await upload(world.firm.agent, id, HEIC_HEAD, 'IMG_0001.HEIC').expect(201);
    expect(res.body).toMatchObject({ mimeType: 'image/heic', hasPreview: false, previewNote: HEIC_NOTE });
  });

  it('takes a PDF', async () => {
    const id = await world.draft();
    const pdf = await PDFDocument.create();
    pdf.addPage();
    const res = await upload(world.firm.agent, id, Buffer.from(await pdf.save()), 'sketch.pdf').expect(201);
    expect(res.body.mimeType).toBe('application/pdf');
  });

  describe('refused, and nothing stored', () => {
    const refusedCases: [string, () => Buffer, string, string][] = [
      ['a text file named .jpg', () => Buffer.from('not a photo at all, just words'), 'photo.jpg', 'file'],
      [
        'a GIF (not a type a request takes)',
        () => Buffer.from('GIF89a\x01\x00\x01\x00\x00\x00\x00;', 'latin1'),
        'a.gif',
        'file',
      ],
      [
        'a file over the size limit',
        () => Buffer.concat([ONE_PIXEL_PNG, Buffer.alloc(MAX_UPLOAD_BYTES)]),
        'big.png',
        'file',
      ],
      ['a name with a back slash', () => ONE_PIXEL_PNG, '..\\boot.png', 'file'],
    ];
    it.each(refusedCases)('%s', async (_what, bytes, name, field) => {
      const id = await world.draft();
      const res = await upload(world.firm.agent, id, bytes(), name).expect(400);
      expect(res.body.error.fields[field]).toHaveLength(1);
      expect(storedFiles()).toEqual([]);
      expect(rows()).toEqual([]);
    });

    it('a name with ../, sent as is (a client library would cut it down to its last part)', async () => {
      const id = await world.draft();
      const boundary = 'tributary-test-boundary';
      const body = Buffer.concat([
        Buffer.from(
          `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="../../etc/passwd.png"\r\n` +
            'Content-Type: image/png\r\n\r\n',
        ),
        ONE_PIXEL_PNG,
        Buffer.from(`\r\n--${boundary}--\r\n`),
      ]);
      const res = await world.firm.agent
        .post(`/api/requests/${id}/attachments`)
        .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
        .send(body)
        .expect(400);
      expect(res.body.error.fields.file).toEqual(['Use a plain file name without folders']);
      expect(storedFiles()).toEqual([]);
      expect(rows()).toEqual([]);
    });

    it('a bad place tag', async () => {
      const id = await world.draft();
      await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'a.png', { place: 'basement-ish' }).expect(400);
      expect(storedFiles()).toEqual([]);
    });

    it('no file part, or JSON instead of a form', async () => {
      const id = await world.draft();
      await world.firm.agent.post(`/api/requests/${id}/attachments`).field('place', 'ridge').expect(400);
      await world.firm.agent.post(`/api/requests/${id}/attachments`).send({ place: 'ridge' }).expect(400);
      expect(storedFiles()).toEqual([]);
    });

    it('another firm’s request: 404; another firm’s file: 404', async () => {
      const id = await world.draft();
      const file = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'a.png').expect(201);
      const stranger = await signedUpAgent(server.app);
      await upload(stranger.agent, id, ONE_PIXEL_PNG, 'b.png').expect(404);
      await stranger.agent.get(`/api/requests/${id}/attachments/${file.body.id}`).expect(404);
      await stranger.agent.get(`/api/requests/${id}/attachments`).expect(404);
      const ownJob = await stranger.agent.post('/api/jobs').send({ name: 'Stranger job' }).expect(201);
      const own = await stranger.agent.post(`/api/jobs/${ownJob.body.id}/requests`).send({}).expect(201);
      // Its own request id with the other firm's file id: the file is not that request's.
      await stranger.agent.get(`/api/requests/${own.body.id}/attachments/${file.body.id}`).expect(404);
      expect(rows()).toHaveLength(1);
      expect(storedFiles()).toHaveLength(1);
    });

    it('the engineer of a Draft sees nothing and stores nothing', async () => {
      const id = await world.draft();
      await upload(world.engineer.agent, id, ONE_PIXEL_PNG, 'a.png').expect(404);
      expect(storedFiles()).toEqual([]);
    });
  });

  describe('by side and state', () => {
    it('photos are the firm’s; the design document is the engineer’s, in review, tied to the version', async () => {
      const id = await world.sent();
      await upload(world.engineer.agent, id, ONE_PIXEL_PNG, 'a.png').expect(403);
      const design = { purpose: 'design', place: 'other', caption: 'Stamped beam design' };
      const early = await upload(world.engineer.agent, id, ONE_PIXEL_PNG, 'design.png', design).expect(409);
      expect(early.body.error.message).toContain('Sent');
      await world.engineer.agent.post(`/api/requests/${id}/status`).send({ to: 'in-review' }).expect(200);
      const res = await upload(world.engineer.agent, id, ONE_PIXEL_PNG, 'design.png', design).expect(201);
      expect(res.body).toMatchObject({ purpose: 'design', version: 1, side: 'engineer' });
      await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'design.png', design).expect(403);
      expect(rows()).toHaveLength(1);
    });

    it('a message carries files its side uploaded for it, never the other side’s', async () => {
      const id = await world.sent('in-review');
      const mine = await upload(world.engineer.agent, id, ONE_PIXEL_PNG, 'markup.png', {
        purpose: 'message',
      }).expect(201);
      const theirs = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'answer.png', {
        purpose: 'message',
      }).expect(201);
      await world.engineer.agent
        .post(`/api/requests/${id}/messages`)
        .send({ body: 'See the markup', attachmentIds: [theirs.body.id] })
        .expect(400);
      const res = await world.engineer.agent
        .post(`/api/requests/${id}/messages`)
        .send({ body: 'See the markup', attachmentIds: [mine.body.id] })
        .expect(201);
      const message = res.body.thread.find((e: { body: string }) => e.body === 'See the markup');
      expect(message.files.map((f: { id: string }) => f.id)).toEqual([mine.body.id]);
      await world.firm.agent.get(`/api/requests/${id}/attachments/${mine.body.id}`).expect(200);
    });
  });
});

describe('removing a photo from the working copy', () => {
  const remove = (agent: Agent, requestId: string, fileId: string) =>
    agent.delete(`/api/requests/${requestId}/attachments/${encodeURIComponent(fileId)}`);
  const audits = () =>
    server.db
      .select()
      .from(auditEvents)
      .all()
      .filter((a) => a.action === 'request.file-remove');

  it('the firm removes it: the row, the stored bytes and the listing go, with an audit event', async () => {
    const id = await world.draft();
    const kept = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'keep.png').expect(201);
    const big = await sharp({
      create: { width: 2400, height: 1600, channels: 3, background: { r: 90, g: 80, b: 70 } },
    })
      .jpeg()
      .toBuffer();
    const gone = await upload(world.firm.agent, id, big, 'wrong-wall.jpg').expect(201);
    expect(gone.body.hasPreview).toBe(true);
    expect(storedFiles()).toHaveLength(3);
    await remove(world.firm.agent, id, gone.body.id).expect(204);
    expect(rows().map((r) => r.id)).toEqual([kept.body.id]);
    // The original and its downscaled copy are both gone; the other photo stays.
    expect(storedFiles()).toHaveLength(1);
    const list = await world.firm.agent.get(`/api/requests/${id}/attachments`).expect(200);
    expect(list.body.files.map((f: { id: string }) => f.id)).toEqual([kept.body.id]);
    await world.firm.agent.get(`/api/requests/${id}/attachments/${gone.body.id}`).expect(404);
    expect(audits()).toHaveLength(1);
    expect(audits()[0].detail).toMatchObject({ attachmentId: gone.body.id, fileName: 'wrong-wall.jpg' });
    // A second try finds nothing to remove and records nothing.
    await remove(world.firm.agent, id, gone.body.id).expect(404);
    expect(audits()).toHaveLength(1);
  });

  it('once sent, the photo stays: 409 for the firm, 403 for the engineer, the snapshot unchanged', async () => {
    const id = await world.draft();
    const file = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'a.png').expect(201);
    await world.firm.agent.post(`/api/requests/${id}/send`).expect(200);
    const refused = await remove(world.firm.agent, id, file.body.id).expect(409);
    expect(refused.body.error.message).toMatch(/went with version 1/);
    await remove(world.engineer.agent, id, file.body.id).expect(403);
    const detail = await world.firm.agent.get(`/api/requests/${id}`).expect(200);
    expect(detail.body.snapshot.files.map((f: { id: string }) => f.id)).toEqual([file.body.id]);
    expect(rows()).toHaveLength(1);
    expect(storedFiles()).toHaveLength(1);
    expect(audits()).toEqual([]);
  });

  it('a photo added after sending can go again before the revision; the revision then keeps it', async () => {
    const id = await world.sent();
    const sentWith = (await world.firm.agent.get(`/api/requests/${id}`).expect(200)).body.snapshot.files;
    const wrong = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'wrong-wall.png').expect(201);
    const right = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'ridge.png').expect(201);
    await remove(world.firm.agent, id, wrong.body.id).expect(204);
    const revised = await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({ note: 'Ridge photo added' })
      .expect(201);
    expect(revised.body.snapshot.files.map((f: { id: string }) => f.id)).toEqual([
      ...sentWith.map((f: { id: string }) => f.id),
      right.body.id,
    ]);
    expect(revised.body.versions[1].changes).toContainEqual(
      expect.objectContaining({ section: 'Photos', field: 'Photo ridge.png', before: null, kind: 'added' }),
    );
    const refused = await remove(world.firm.agent, id, right.body.id).expect(409);
    expect(refused.body.error.message).toMatch(/went with version 2/);
    expect(audits()).toHaveLength(1);
  });

  it('another firm, the engineer of a Draft, hostile and foreign ids: refused, nothing removed', async () => {
    const id = await world.draft();
    const file = await upload(world.firm.agent, id, ONE_PIXEL_PNG, 'a.png').expect(201);
    const stranger = await signedUpAgent(server.app);
    await remove(stranger.agent, id, file.body.id).expect(404);
    await remove(world.engineer.agent, id, file.body.id).expect(404);
    await remove(world.firm.agent, id, '../../storage').expect(404);
    await remove(world.firm.agent, id, 'x'.repeat(101)).expect(400);
    // Another Draft of the same firm: the file is not that request's.
    const other = await world.draft();
    await remove(world.firm.agent, other, file.body.id).expect(404);
    await world.firm.agent.delete(`/api/requests/${id}/attachments/${file.body.id}`).send({}).expect(204);
    expect(rows()).toEqual([]);
    expect(audits()).toHaveLength(1);
  });
});
