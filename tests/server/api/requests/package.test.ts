import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { PDFDocument, PDFName, PDFRawStream } from 'pdf-lib';
import { PDFParse } from 'pdf-parse';
import sharp from 'sharp';
import type { Response } from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { CAUTION_TEXT } from '@/lib/calc';
import {
  readRequestPackage,
  requestPackageJsonSchema,
  requestPackageSchema,
} from '@/shared/schemas/requests/package';
import { ONE_PIXEL_PNG, requestWorld } from '@/tests/helpers/design-requests';
import { readZip } from '@/tests/helpers/read-zip';
import { SAMPLE_HEADER } from '@/tests/helpers/sample-bodies';
import { createTestServer, signedUpAgent, type Agent, type TestServer } from '@/tests/helpers/server';

let server: TestServer;
let world: Awaited<ReturnType<typeof requestWorld>>;
beforeEach(async () => {
  server = await createTestServer();
  world = await requestWorld(server);
});
afterEach(() => server.close());

const binary = (agent: Agent, path: string) =>
  agent
    .get(path)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });

const HEIC_HEAD = Buffer.concat([
  Buffer.from([0, 0, 0, 0x18]),
  Buffer.from('ftypheicmif1', 'latin1'),
  Buffer.alloc(70),
]);

/** A sent request with a photo (large JPEG), a small PNG, a HEIC and a second member with a point load. */
async function sentWithPhotos(): Promise<string> {
  const second = await world.firm.agent.post(`/api/jobs/${world.jobId}/members`).send({
    label: 'Living room beam',
    input: {
      ...SAMPLE_HEADER,
      kind: 'beam',
      clearSpanFt: 12,
      materialId: 'lvl-2.0e',
      sizeId: '3-ply-1.75x11.875',
      sources: [
        { kind: 'floor', tributaryFt: 7, deadPsf: 10, livePsf: 40 },
        {
          kind: 'point',
          pointKind: 'post-above',
          atFt: 4,
          deadLb: 800,
          liveLb: 1200,
          roofLiveLb: 0,
          snowLb: 0,
        },
      ],
    },
  });
  const memberIds = second.status === 201 ? [world.memberId, second.body.id] : [world.memberId];
  expect(second.status, second.text).toBe(201);
  const id = await world.draft();
  await world.firm.agent.patch(`/api/requests/${id}`).send({ memberIds }).expect(200);
  const big = await sharp({ create: { width: 2400, height: 1600, channels: 3, background: '#6b5a44' } })
    .jpeg()
    .toBuffer();
  const upload = (bytes: Buffer, name: string, place: string, caption: string) =>
    world.firm.agent
      .post(`/api/requests/${id}/attachments`)
      .field('place', place)
      .field('caption', caption)
      .attach('file', bytes, name)
      .expect(201);
  await upload(big, 'attic.jpg', 'attic-over-wall', 'Joists lapped over the wall');
  await upload(ONE_PIXEL_PNG, 'stamp.png', 'grade-stamp', 'Grade stamp on a joist');
  await upload(HEIC_HEAD, 'IMG_0002.HEIC', 'below-wall', 'Girder below');
  await world.firm.agent.post(`/api/requests/${id}/send`).expect(200);
  return id;
}

/** The PDF's text as pdf-parse reads it, whitespace runs made one space. */
async function pdfText(bytes: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  const { text } = await parser.getText();
  await parser.destroy();
  return text.replace(/\s+/g, ' ');
}

/** Image XObjects in the PDF: the photos only, since the diagrams are vector paths. */
function imageCount(pdf: PDFDocument): number {
  return pdf.context
    .enumerateIndirectObjects()
    .filter(
      ([, object]) =>
        object instanceof PDFRawStream && object.dict.get(PDFName.of('Subtype')) === PDFName.of('Image'),
    ).length;
}

describe('the PDF', () => {
  it('parses, and holds the cover, the members, the takedown, checks, diagrams, photos, caution and engineer block', async () => {
    const id = await sentWithPhotos();
    const res = await binary(world.engineer.agent, `/api/requests/${id}/package.pdf`).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe('attachment; filename="design-request-1-v1.pdf"');
    const bytes = res.body as Buffer;
    const pdf = await PDFDocument.load(bytes);
    // Cover and conditions, two member pages or more, photos, the engineer's page.
    expect(pdf.getPageCount()).toBeGreaterThanOrEqual(5);
    expect(pdf.getTitle()).toBe('Design request 1 v1: Kitchen opening (demo)');
    expect(imageCount(pdf)).toBe(2);
    const flat = await pdfText(bytes);
    for (const expected of [
      'Request 1, version 1',
      'Kitchen opening (demo)',
      'Sample Remodeling',
      'County table (demo)',
      'Kitchen header',
      'Living room beam',
      'Load takedown',
      'Inputs and their flags',
      'Checks',
      'Shear V (lb)',
      'Moment M (lb·ft)',
      'Deflection (in, down)',
      'Section (not to scale)',
      'Plan (not to scale)',
      'Attic over the wall: Joists lapped over the wall',
      'Grade stamp: Grade stamp on a joist',
      'IMG_0002.HEIC (image/heic) is not drawn here',
      'For the engineer: design and stamp',
      'Stamp or seal reference, licence number and state',
      'Can the beam be flush with the joists?',
    ]) {
      expect(flat).toContain(expected);
    }
    expect(flat).toContain(CAUTION_TEXT.slice(0, 60));
  });
});

describe('the load path section in the PDF', () => {
  it('draws the recorded chain (the member, its state, each open end with its load) and still parses', async () => {
    const id = await sentWithPhotos();
    const json = await world.engineer.agent.get(`/api/requests/${id}/package.json`).expect(200);
    const chain = requestPackageSchema.parse(json.body).request.members[0].loadPath ?? [];
    expect(chain.length).toBeGreaterThan(0);
    const res = await binary(world.engineer.agent, `/api/requests/${id}/package.pdf`).expect(200);
    const bytes = res.body as Buffer;
    await PDFDocument.load(bytes);
    const flat = await pdfText(bytes);
    // The drawing's box words (kind and state) and each open end's chip ("… lb → ?").
    expect(flat).toContain('! Load path open');
    expect(flat).toContain('Load arriving (unfactored)');
    expect(flat).toContain('New member');
    const chips = flat.match(/[\d,]+ lb → \?/g) ?? [];
    expect(chips.length).toBeGreaterThanOrEqual(chain[0].ends.length);
  });
});

describe('the JSON package', () => {
  it('validates against its own schema and round-trips', async () => {
    const id = await sentWithPhotos();
    const res = await world.engineer.agent.get(`/api/requests/${id}/package.json`).expect(200);
    const parsed = requestPackageSchema.parse(res.body);
    expect(parsed).toMatchObject({ format: 'tributary.design-request', formatVersion: 3, state: 'sent' });
    // Format 2: each member carries its chain to the ground; nothing says what its ends bear on yet.
    const chain = parsed.request.members[0].loadPath;
    expect(chain?.[0]).toMatchObject({ depth: 0, state: 'load-path-open', closed: false });
    expect(chain?.[0].openReasons).toContain('Left end: say what it bears on.');
    expect(parsed.request.files.map((f) => f.place)).toEqual([
      'attic-over-wall',
      'grade-stamp',
      'below-wall',
    ]);
    const again = readRequestPackage(JSON.parse(JSON.stringify(parsed)));
    expect(again.ok && again.package).toEqual(parsed);
  });

  it('reading back refuses what is not a package, naming the problems', () => {
    expect(readRequestPackage({ format: 'tributary.design-request', formatVersion: 99 })).toMatchObject({
      ok: false,
      problems: expect.arrayContaining([
        expect.stringMatching(/^formatVersion: /),
        expect.stringMatching(/^request: /),
      ]),
    });
  });

  it('the published JSON Schema is the one the zod schema generates', () => {
    const published = JSON.parse(readFileSync('docs/design-request-package.schema.json', 'utf8'));
    expect(published).toEqual(requestPackageJsonSchema());
    expect(published.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
  });
});

describe('the load table and the photo zip', () => {
  it('lists every takedown line per member: line loads with extents, point loads with positions', async () => {
    const id = await sentWithPhotos();
    const res = await world.engineer.agent.get(`/api/requests/${id}/loads.csv`).expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    const rows = Papa.parse<Record<string, string>>(res.text, { header: true, skipEmptyLines: true }).data;
    const pkg = requestPackageSchema.parse(
      (await world.engineer.agent.get(`/api/requests/${id}/package.json`)).body,
    );
    expect(rows).toHaveLength(pkg.request.members.reduce((n, m) => n + m.result.takedown.length, 0));
    expect(new Set(rows.map((r) => r['load type']))).toEqual(new Set(['D', 'L', 'Lr']));
    const point = rows.filter((r) => r.kind === 'point');
    expect(point.map((r) => [r.member, r['load type'], r['P (lb)'], r['at (ft)']])).toEqual(
      expect.arrayContaining([
        ['Living room beam', 'D', '800', expect.any(String)],
        ['Living room beam', 'L', '1200', expect.any(String)],
      ]),
    );
    const line = rows.find((r) => r.member === 'Kitchen header' && r.kind === 'line');
    expect(Number(line?.['end (ft)'])).toBeGreaterThan(Number(line?.['start (ft)']));
  });

  it('zips the photos at full resolution with their metadata', async () => {
    const id = await sentWithPhotos();
    const res = await binary(world.engineer.agent, `/api/requests/${id}/photos.zip`).expect(200);
    expect(res.headers['content-type']).toBe('application/zip');
    const entries = readZip(res.body as Buffer);
    const about = JSON.parse(entries.get('photos.json')?.toString('utf8') ?? '{}');
    expect(about.photos.map((p: { entry: string }) => p.entry)).toEqual([
      'photos/01-attic-over-wall-attic.jpg',
      'photos/02-grade-stamp-stamp.png',
      'photos/03-below-wall-IMG_0002.HEIC',
    ]);
    for (const photo of about.photos as { entry: string; sha256: string }[]) {
      const bytes = entries.get(photo.entry);
      expect(
        createHash('sha256')
          .update(bytes ?? Buffer.alloc(0))
          .digest('hex'),
      ).toBe(photo.sha256);
    }
    expect(about.photos[0]).toMatchObject({
      widthPx: 2400,
      heightPx: 1600,
      caption: 'Joists lapped over the wall',
    });
  });
});

describe('every download checks access', () => {
  const downloads = ['package.pdf', 'package.json', 'loads.csv', 'photos.zip'];

  it.each(downloads)(
    '%s: another firm and an engineer it is not addressed to get 404; a Draft 409',
    async (what) => {
      const id = await world.sent();
      const stranger = await signedUpAgent(server.app);
      const otherEngineer = await signedUpAgent(server.app, { firmKind: 'engineering' });
      const statuses = async (agent: Agent) =>
        ((await agent.get(`/api/requests/${id}/${what}`)) as Response).status;
      expect(await statuses(stranger.agent)).toBe(404);
      expect(await statuses(otherEngineer.agent)).toBe(404);
      expect(await statuses(world.firm.agent)).toBe(200);
      const draft = await world.draft();
      expect((await world.firm.agent.get(`/api/requests/${draft}/${what}`)).status).toBe(409);
    },
  );
});

describe('what changed, in the PDF of a revision', () => {
  it('lists every change in words by member and section, materials by their catalogue names, and parses', async () => {
    const id = await world.sent();
    // Version 2: a longer opening on the sent header, and a beam on posts added (invented demo values).
    await world.firm.agent
      .patch(`/api/members/${world.memberId}`)
      .send({ input: { ...SAMPLE_HEADER, clearSpanFt: 7, plateMaterialId: 'sawn-spruce-pine-fir-no1-no2' } })
      .expect(200);
    const added = (label: string) =>
      world.firm.agent
        .post(`/api/jobs/${world.jobId}/members`)
        .send({
          label,
          input: {
            ...SAMPLE_HEADER,
            kind: 'beam',
            supportKind: 'post',
            posts: { materialId: 'sawn-hem-fir-no2', sizeId: '6x6', heightFt: 7 },
          },
        })
        .expect(201);
    const beams = [await added('Porch beam'), await added('Garage beam'), await added('Deck beam')];
    await world.firm.agent
      .post(`/api/requests/${id}/revisions`)
      .send({
        note: 'Three beams on posts too',
        draft: { memberIds: [world.memberId, ...beams.map((b) => b.body.id)] },
      })
      .expect(201);
    const json = await world.engineer.agent.get(`/api/requests/${id}/package.json`).expect(200);
    const { changes } = requestPackageSchema.parse(json.body);
    // Catalogue names (NDS Supplement 2018 Table 4A species and grade labels), not ids.
    expect(changes).toContainEqual(
      expect.objectContaining({
        group: 'Porch beam (added)',
        field: 'Posts: material',
        after: 'Hem-Fir No.2 (assumed)',
      }),
    );
    expect(changes).toContainEqual(
      expect.objectContaining({
        group: 'Kitchen header',
        field: 'Plate under the jack studs',
        before: null,
        after: 'Spruce-Pine-Fir No.1/No.2 (assumed)',
      }),
    );
    // More than the old table's cap of lines: the PDF lists them all.
    expect(changes.length).toBeGreaterThan(80);

    const res = await binary(world.engineer.agent, `/api/requests/${id}/package.pdf`).expect(200);
    const bytes = res.body as Buffer;
    await PDFDocument.load(bytes);
    const flat = await pdfText(bytes);
    for (const expected of [
      'What changed since version 1',
      `${changes.length} changes`,
      'Was (version 1)',
      'Now (version 2)',
      'Span and bearing',
      `Clear span 6' 0" (assumed) 7' 0" (assumed)`,
      'Porch beam (added)',
      'Hem-Fir No.2 (assumed)',
      'Spruce-Pine-Fir No.1/No.2 (assumed)',
    ]) {
      expect(flat).toContain(expected);
    }
    expect(flat).not.toMatch(/members\.|\.summary\.|sawn-hem-fir/);
    // Every line is in the PDF, the last member's too: nothing is cut off (short fields do not wrap).
    expect(flat).toContain('Deck beam (added)');
    const deck = flat.slice(flat.indexOf('Deck beam (added)'));
    for (const line of changes.filter((c) => c.group === 'Deck beam (added)' && c.field.length < 24))
      expect(deck).toContain(line.field);
  }, 90_000); // four members' pages: the PDF is made on a shared, busy machine
});
