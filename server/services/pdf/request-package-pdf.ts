import { CAUTION_TEXT } from '@/lib/calc';
import { formatLb, formatNumber } from '@/lib/format';
import type { RequestPackage } from '@/shared/schemas/requests/package';
import { DESIGNED_MATERIAL_LABELS } from '@/shared/schemas/requests/reply';
import {
  PHOTO_PLACE_LABELS,
  type SnapshotFile,
  type SnapshotMember,
} from '@/shared/schemas/requests/snapshot';
import { REQUEST_STATE_LABELS } from '@/shared/schemas/requests/workflow';
import { drawMemberDiagrams, drawSketch } from './pdf-diagrams';
import { drawLoadPathSection } from './pdf-load-path';
import { MUTED, PAGE, RULE, PdfWriter } from './pdf-writer';

/**
 * A photo's bytes for the PDF: the downscaled copy when there is one; null for a HEIC (not decodable here).
 * Plain bytes rather than a Buffer: the PDF is made in a worker thread, and a Buffer arrives there as bytes.
 */
export interface PackagePhoto {
  file: SnapshotFile;
  bytes: Uint8Array | null;
  mimeType: string;
}

const yesNo = (value: boolean) => (value ? 'yes' : 'no');
const orDash = (value: string | number | null | undefined) =>
  value === null || value === undefined || value === '' ? '—' : String(value);

function cover(w: PdfWriter, pkg: RequestPackage): void {
  const r = pkg.request;
  w.text('Tributary design request', { size: 11, color: MUTED });
  w.text(`Request ${r.number}, version ${r.version}`, { size: 22, bold: true });
  w.text(`${r.job.name}${r.job.address ? `, ${r.job.address}` : ''}`, { size: 13 });
  w.space(8);
  w.facts([
    ['State', REQUEST_STATE_LABELS[pkg.state]],
    ['Firm', r.firm.name],
    ['Contractor', `${r.contractor.name} <${r.contractor.email}>`],
    ['Engineer', r.engineerEmail],
    ['Sent', r.sentAt.slice(0, 10)],
    ['Jurisdiction', [r.jurisdiction.place, r.jurisdiction.state].filter(Boolean).join(', ')],
    ['Load standard', r.job.loadStandard],
    ['Ground snow', `${formatNumber(r.job.groundSnowPsf)} psf (source: ${orDash(r.job.groundSnowSource)})`],
    ['Adopted code', r.job.adoptedCode],
    [
      'House',
      `built ${orDash(r.job.yearBuilt)}, ${r.job.stories} ${r.job.stories === 1 ? 'story' : 'stories'}, ${r.job.roofType} roof at ${r.job.roofPitchIn12} in 12, foundation ${r.job.foundation}`,
    ],
    [
      'Building width',
      r.job.buildingWidthFt === null ? null : `${formatNumber(r.job.buildingWidthFt, 1)} ft`,
    ],
    ['Engine version', r.engineVersion],
  ]);
  w.space(10);
  w.box(CAUTION_TEXT);
  w.heading('Members');
  w.table(
    ['Member', 'Kind', 'Preliminary size', 'Governing check', 'Ratio', 'State', 'Reactions L / R'],
    r.members.map((m) => [
      m.label,
      m.kind,
      `${m.summary.sizeLabel} ${m.summary.materialLabel}`,
      m.summary.governingCheck,
      formatNumber(m.summary.governingRatio, 2),
      m.summary.state.replace('-', ' '),
      `${formatLb(m.result.reactions.leftLb)} / ${formatLb(m.result.reactions.rightLb)}`,
    ]),
    [0.15, 0.09, 0.24, 0.14, 0.08, 0.13, 0.17],
  );
}

function conditions(w: PdfWriter, pkg: RequestPackage): void {
  const r = pkg.request;
  const p = r.phoneBack;
  w.heading('Existing conditions');
  w.facts([
    ['Framing direction', r.conditions.framingDirection],
    ['Bearing points', r.conditions.bearingPoints],
    ['Foundation', r.conditions.foundation],
    ['What is above', r.conditions.whatIsAbove],
  ]);
  w.heading('Constraints', 11);
  w.facts([
    ['Flush or dropped', r.constraints.mount],
    [
      'Maximum depth',
      r.constraints.maxDepthIn === null ? null : `${formatNumber(r.constraints.maxDepthIn, 2)} in`,
    ],
    ['Where posts may go', r.constraints.postsMayGo],
    [
      'Longest piece that can be carried in',
      r.constraints.longestPieceFt === null ? null : `${formatNumber(r.constraints.longestPieceFt, 1)} ft`,
    ],
    [
      'Heaviest piece',
      r.constraints.heaviestPieceLb === null ? null : formatLb(r.constraints.heaviestPieceLb),
    ],
  ]);
  w.heading('What engineers ask for', 11);
  w.table(
    ['Item', 'As found', 'Flag'],
    [
      [
        'Existing joists or rafters',
        `${orDash(p.joists.size)} at ${orDash(p.joists.spacingIn)} in, ${orDash(p.joists.species)}; tape in photo: ${yesNo(p.joists.tapeInPhoto)}`,
        p.joists.flag,
      ],
      ['Roofing layers', orDash(p.roofingLayers), ''],
      [
        'Heavy items above',
        [p.heavyAbove.join(', '), p.heavyAboveNote].filter(Boolean).join('; ') || '—',
        '',
      ],
      [
        'Sag',
        p.sag.sagIn === null
          ? '—'
          : `${formatNumber(p.sag.sagIn, 2)} in${p.sag.stringLine ? ' (string line)' : ''}`,
        p.sag.flag,
      ],
      [
        'Sistered, notched, bored, rot',
        `sistered ${yesNo(p.damage.sistered)}, notched ${yesNo(p.damage.notched)}, bored ${yesNo(p.damage.bored)}, rot ${yesNo(p.damage.rot)}${p.damage.note ? `; ${p.damage.note}` : ''}`,
        '',
      ],
      [
        'Girder, columns, footings below',
        [p.below.girder, p.below.columns, p.below.footings].map(orDash).join(' / '),
        '',
      ],
      [
        'Engineered lumber the yard stocks',
        p.yardStock.map((y) => `${y.product} ${y.eGrade}`.trim()).join('; ') || '—',
        '',
      ],
      ['Ducts or pipes in the joist bays', orDash(p.ductsOrPipes), ''],
    ],
    [0.3, 0.58, 0.12],
  );
  if (r.questions) {
    w.heading('Questions for the engineer', 11);
    w.text(r.questions);
  }
  changes(w, pkg);
}

const KIND_WORDS = { changed: '', added: 'added', removed: 'removed' } as const;

/**
 * What changed since the version before, in the request page's words: a heading per group (the request's
 * parts, then each member), then a table of section, field, before and now that wraps and runs on across pages.
 */
function changes(w: PdfWriter, pkg: RequestPackage): void {
  if (pkg.changes.length === 0) return;
  const r = pkg.request;
  w.heading(`What changed since version ${r.version - 1}`, 11);
  w.text(
    `${pkg.changes.length} ${pkg.changes.length === 1 ? 'change' : 'changes'}; values as the app shows them, each input with its flag.`,
    { size: 8.5, color: MUTED },
  );
  const groups = new Map<string, RequestPackage['changes']>();
  for (const line of pkg.changes) {
    const lines = groups.get(line.group);
    if (lines) lines.push(line);
    else groups.set(line.group, [line]);
  }
  for (const [group, lines] of groups) {
    w.heading(group, 10);
    w.table(
      ['Section', 'What', `Was (version ${r.version - 1})`, `Now (version ${r.version})`],
      lines.map((c) => [
        c.section,
        KIND_WORDS[c.kind] ? `${c.field} (${KIND_WORDS[c.kind]})` : c.field,
        c.before ?? '—',
        c.after ?? '—',
      ]),
      [0.18, 0.3, 0.26, 0.26],
      8,
    );
  }
}

const lbText = (lb: number) => `${formatNumber(Math.round(lb), 0)} lb`;
/** An unfactored load by type, "D 804 + Lr 1,014 lb"; types with none left out. */
const byTypeText = (load: Record<string, number | undefined>) =>
  `${(['D', 'L', 'Lr', 'S'] as const)
    .filter((type) => (load[type] ?? 0) > 0)
    .map((type) => `${type} ${formatNumber(Math.round(load[type] ?? 0), 0)}`)
    .join(' + ')} lb`;
const totalLb = (load: Record<string, number | undefined>) =>
  Object.values(load).reduce<number>((sum, v) => sum + (v ?? 0), 0);

/** The member's chain to the ground: each step's load arriving, its check and state, ends, reasons, flags. */
function loadPath(w: PdfWriter, m: SnapshotMember): void {
  if (!m.loadPath) return;
  w.heading('Load path to the ground', 11);
  const top = m.loadPath[0];
  w.text(
    top?.closed
      ? 'Closed: every end reaches a confirmed footing or foundation wall through framing that passes.'
      : 'Open: the load does not yet reach the ground through checked framing (reasons below).',
    { bold: true },
  );
  drawLoadPathSection(w, m.loadPath);
  w.table(
    ['Level', 'Step', 'Load arriving (unfactored)', 'Check', 'State', 'Ends'],
    m.loadPath.map((step) => [
      String(step.depth),
      `${step.label} (${step.kind})`,
      step.incoming.length === 0
        ? 'its own loads'
        : step.incoming
            .map(
              (i) =>
                `${lbText(totalLb(i.load))} from ${i.fromLabel}${i.atFt ? ` at ${formatNumber(i.atFt, 2)} ft` : ''} (${byTypeText(i.load)})`,
            )
            .join('; '),
      step.governing
        ? `${step.governing.check} ${formatNumber(step.governing.ratio, 2)} (${step.governing.combination})`
        : step.checks.map((c) => `${c.label} ${formatNumber(c.ratio, 2)} (${c.combination})`).join('; ') ||
          (step.pad ? `pad ${step.pad.sideIn} in square` : '—'),
      step.state.replace(/-/g, ' '),
      step.ends
        .map(
          (e) =>
            `${e.end} → ${e.ontoLabel ?? 'nothing yet'}: ${lbText(e.governingLb)} (${e.governingCombination})`,
        )
        .join('; ') || 'ground',
    ]),
    [0.06, 0.18, 0.22, 0.2, 0.1, 0.24],
    7,
  );
  const notes = m.loadPath.flatMap((step) => [
    ...step.openReasons.map((r) => `${step.label} — open: ${r}`),
    ...step.engineerReasons.map((r) => `${step.label} — engineer required: ${r}`),
    ...step.assumptions.map((r) => `${step.label} — assumed: ${r}`),
    ...step.warnings.map((r) => `${step.label} — warning: ${r}`),
  ]);
  for (const note of notes) w.text(`• ${note}`, { size: 8 });
}

function member(w: PdfWriter, m: SnapshotMember): void {
  w.newPage();
  w.heading(`${m.label} (${m.kind}${m.wall ? `, ${m.wall}` : ''})`, 15);
  w.text(
    `Preliminary size: ${m.summary.sizeLabel} ${m.summary.materialLabel}. Design span ${formatNumber(m.result.spans.designSpanFt, 2)} ft, length to buy ${formatNumber(m.result.spans.lengthToBuyFt, 2)} ft.`,
  );
  w.heading('Inputs and their flags', 11);
  w.table(
    ['Input', 'Value', 'Flag'],
    m.result.inputs.map((i) => [i.label, `${String(i.value)}${i.unit ? ` ${i.unit}` : ''}`, i.flag]),
    [0.5, 0.35, 0.15],
    7.5,
  );
  w.heading('Load takedown', 11);
  w.table(
    ['Source', 'Type', 'How', 'Load', 'Where'],
    m.result.takedown.map((t) => [
      t.label,
      t.type,
      t.expression,
      t.pLb !== undefined ? formatLb(t.pLb) : `${formatNumber(t.wPlf ?? 0)} plf`,
      t.atFt !== undefined
        ? `at ${formatNumber(t.atFt, 2)} ft`
        : t.startFt !== undefined
          ? `${formatNumber(t.startFt, 2)}–${formatNumber(t.endFt ?? 0, 2)} ft`
          : 'full length',
    ]),
    [0.2, 0.07, 0.43, 0.15, 0.15],
    7.5,
  );
  w.heading('Checks', 11);
  w.table(
    ['Check', 'Demand', 'Capacity', 'Ratio', 'Result', 'Combination'],
    m.result.checks.map((c) => [
      c.label,
      `${formatNumber(c.demand, 2)} ${c.unit}`,
      `${formatNumber(c.capacity, 2)} ${c.unit}`,
      formatNumber(c.ratio, 2),
      c.pass ? 'passes' : 'fails',
      c.combination,
    ]),
    [0.22, 0.16, 0.16, 0.1, 0.1, 0.26],
    7.5,
  );
  loadPath(w, m);
  w.heading('Diagrams', 11);
  drawMemberDiagrams(w, m.result);
  w.heading('Sketch from the inputs', 11);
  drawSketch(w, m.input, m.result);
  const notes = [...m.result.warnings, ...m.summary.engineerReasons.map((r) => `Engineer needed: ${r}`)];
  if (notes.length > 0) {
    w.heading('Assumptions, warnings and flags', 11);
    for (const note of notes) w.text(`• ${note}`, { size: 8.5 });
  }
  w.heading('Sources', 11);
  for (const source of m.result.sources) w.text(source, { size: 7.5, color: MUTED });
}

async function photos(w: PdfWriter, list: PackagePhoto[]): Promise<void> {
  if (list.length === 0) return;
  w.newPage();
  w.heading('Photos and sketches', 15);
  for (const photo of list) {
    const label = `${PHOTO_PLACE_LABELS[photo.file.place]}: ${photo.file.caption || photo.file.fileName}`;
    if (!photo.bytes) {
      w.text(label, { bold: true });
      w.text(
        `${photo.file.fileName} (${photo.file.mimeType}) is not drawn here: download it with the photos.`,
        { color: MUTED },
      );
      continue;
    }
    const image =
      photo.mimeType === 'image/png' ? await w.doc.embedPng(photo.bytes) : await w.doc.embedJpg(photo.bytes);
    const scale = Math.min(w.contentWidth / image.width, 300 / image.height, 1);
    const height = image.height * scale;
    w.ensure(height + 30);
    w.text(label, { bold: true });
    w.space(height + 4);
    w.page.drawImage(image, { x: PAGE.margin, y: w.y, width: image.width * scale, height });
    w.space(10);
  }
}

function engineerBlock(w: PdfWriter, pkg: RequestPackage): void {
  w.newPage();
  w.heading('For the engineer: design and stamp', 15);
  const reply = pkg.reply;
  if (reply) {
    w.text(`Structured reply to version ${reply.version}:`, { bold: true });
    w.table(
      ['Member', 'Designed member', 'Fastening, hangers', 'Bearing, posts, footing', 'Connections'],
      reply.reply.members.map((d) => [
        pkg.request.members.find((m) => m.id === d.memberId)?.label ?? d.memberId,
        `${DESIGNED_MATERIAL_LABELS[d.material]}: ${d.designation}`,
        [d.plyFastening, d.hangers].filter(Boolean).join('; '),
        [`${orDash(d.bearingLeftIn)} / ${orDash(d.bearingRightIn)} in`, d.posts, d.footing]
          .filter(Boolean)
          .join('; '),
        d.connections,
      ]),
      [0.14, 0.26, 0.2, 0.24, 0.16],
      7.5,
    );
    if (reply.reply.verifyInField.length > 0) {
      w.text('Verify in the field:', { bold: true });
      for (const item of reply.reply.verifyInField)
        w.text(`• ${item.item}${item.photo ? ' (photo wanted)' : ''}`, { size: 8.5 });
    }
  }
  const lines = [
    'Designed member, plies and fastening',
    'Bearing lengths, posts and footing',
    'Connections and hangers',
    'Shoring',
    'Stamp or seal reference, licence number and state',
    'Name, signature and date',
  ];
  for (const line of lines) {
    w.ensure(44);
    w.text(line, { size: 9, color: MUTED });
    w.space(22);
    w.page.drawLine({
      start: { x: PAGE.margin, y: w.y },
      end: { x: PAGE.margin + w.contentWidth, y: w.y },
      thickness: 0.6,
      color: RULE,
    });
    w.space(6);
  }
  w.space(8);
  w.box(CAUTION_TEXT);
}

/**
 * The design request package as a PDF: cover with the member summary, the conditions and what engineers
 * ask for, per member the inputs with flags, takedown, checks, four vector diagrams and a sketch, the
 * photos with their tags, and a page left for the engineer's design and stamp. Every page ends with the
 * preliminary caution.
 */
export async function requestPackagePdf(pkg: RequestPackage, photoList: PackagePhoto[]): Promise<Uint8Array> {
  const r = pkg.request;
  const w = await PdfWriter.create(
    `Design request ${r.number} v${r.version}: ${r.job.name}`,
    `Request ${r.number} v${r.version} · ${CAUTION_TEXT}`,
  );
  cover(w, pkg);
  conditions(w, pkg);
  for (const m of r.members) member(w, m);
  await photos(w, photoList);
  engineerBlock(w, pkg);
  return w.finish();
}
