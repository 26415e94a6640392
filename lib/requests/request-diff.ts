import { foundationLabels, roofTypeLabels } from '@/lib/ui/job-labels';
import { DAMAGE_LABELS, HEAVY_ITEM_LABELS } from '@/lib/ui/requests/compose-draft';
import {
  PHOTO_PLACE_LABELS,
  type RequestSnapshot,
  type SnapshotFile,
} from '@/shared/schemas/requests/snapshot';
import {
  compareFields,
  compareKeyed,
  ftText,
  inText,
  lbText,
  numberText,
  psfText,
  text,
  yesNo,
  type DiffLine,
  type Field,
} from './diff-fields';

type S = RequestSnapshot;

const MOUNT_CHOICE_WORDS = { flush: 'Flush', dropped: 'Dropped', either: 'Either' };

const jobFields: Field<S>[] = [
  ['Job name', (s) => s.job.name],
  ['Address', (s) => text(s.job.address)],
  ['Year built', (s) => (s.job.yearBuilt ? String(s.job.yearBuilt) : null)],
  ['Stories', (s) => String(s.job.stories)],
  ['Roof type', (s) => roofTypeLabels[s.job.roofType ?? 'gable']],
  ['Roof slope', (s) => numberText(s.job.roofPitchIn12, 'in 12')],
  ['Building width', (s) => ftText(s.job.buildingWidthFt)],
  ['Adopted code', (s) => s.job.adoptedCode ?? null],
  ['Load standard', (s) => s.job.loadStandard ?? null],
  ['Ground snow', (s) => psfText(s.job.groundSnowPsf)],
  ['Ground snow source', (s) => text(s.job.groundSnowSource)],
  ['Foundation', (s) => foundationLabels[s.job.foundation ?? 'unknown']],
  ['Engineer’s e-mail', (s) => s.engineerEmail],
  ['Engine version', (s) => s.engineVersion],
];

const damage = (s: S) => {
  const marks = (['sistered', 'notched', 'bored', 'rot'] as const).filter((m) => s.phoneBack.damage[m]);
  return marks.length ? marks.map((m) => DAMAGE_LABELS[m]).join(', ') : null;
};

const conditionFields: Field<S>[] = [
  ['Town or county', (s) => text(s.jurisdiction.place)],
  ['State', (s) => s.jurisdiction.state],
  ['Framing direction', (s) => text(s.conditions.framingDirection)],
  ['Bearing points', (s) => text(s.conditions.bearingPoints)],
  ['Foundation under the wall', (s) => text(s.conditions.foundation)],
  ['What is above', (s) => text(s.conditions.whatIsAbove)],
  ['Flush or dropped', (s) => MOUNT_CHOICE_WORDS[s.constraints.mount]],
  ['Greatest depth', (s) => inText(s.constraints.maxDepthIn)],
  ['Where posts may go', (s) => text(s.constraints.postsMayGo)],
  ['Longest piece that can be carried in', (s) => ftText(s.constraints.longestPieceFt)],
  ['Heaviest piece that can be carried in', (s) => lbText(s.constraints.heaviestPieceLb)],
  ['Existing joists: size', (s) => text(s.phoneBack.joists.size)],
  ['Existing joists: spacing', (s) => inText(s.phoneBack.joists.spacingIn)],
  ['Existing joists: species', (s) => text(s.phoneBack.joists.species)],
  ['Existing joists: tape in the photo', (s) => yesNo(s.phoneBack.joists.tapeInPhoto)],
  ['Existing joists: flag', (s) => s.phoneBack.joists.flag],
  ['Roofing layers', (s) => numberText(s.phoneBack.roofingLayers)],
  ['Heavy things above', (s) => s.phoneBack.heavyAbove.map((h) => HEAVY_ITEM_LABELS[h]).join(', ') || null],
  ['Sag measured', (s) => inText(s.phoneBack.sag.sagIn)],
  ['Sag: with a string line', (s) => yesNo(s.phoneBack.sag.stringLine)],
  ['Sag: flag', (s) => s.phoneBack.sag.flag],
  ['Damaged framing', damage],
  ['Girder below', (s) => text(s.phoneBack.below.girder)],
  ['Columns below', (s) => text(s.phoneBack.below.columns)],
  ['Footings below', (s) => text(s.phoneBack.below.footings)],
  [
    'Engineered lumber the yard stocks',
    (s) =>
      s.phoneBack.yardStock.map((y) => [y.product, y.eGrade].filter(Boolean).join(' ')).join('; ') || null,
  ],
  ['Ducts or pipes in the joist bays', (s) => text(s.phoneBack.ductsOrPipes)],
];

const noteFields: Field<S>[] = [
  ['Job notes', (s) => text(s.job.notes)],
  ['Heavy things above: note', (s) => text(s.phoneBack.heavyAboveNote)],
  ['Damaged framing: note', (s) => text(s.phoneBack.damage.note)],
];

const questionFields: Field<S>[] = [['Questions for the engineer', (s) => text(s.questions)]];

const photoFields: Field<SnapshotFile>[] = [
  ['where it was taken', (f) => PHOTO_PLACE_LABELS[f.place]],
  ['caption', (f) => text(f.caption)],
];

const byId = (files: SnapshotFile[]) => new Map(files.map((f) => [f.id, f]));
const photoName = (f: SnapshotFile) => `Photo ${f.fileName}`;
const describePhoto = (f: SnapshotFile) =>
  `${PHOTO_PLACE_LABELS[f.place]}${f.caption ? `: ${f.caption}` : ''}`;

export type RequestSectionId = 'job' | 'conditions' | 'photos' | 'notes' | 'questions';

/** What changed in the request's own parts (the job, what was composed, the file list), by section. */
export function requestSections(before: S, after: S): Record<RequestSectionId, DiffLine[]> {
  return {
    job: compareFields(jobFields, before, after),
    conditions: compareFields(conditionFields, before, after),
    photos: compareKeyed(byId(before.files), byId(after.files), photoName, describePhoto, photoFields),
    notes: compareFields(noteFields, before, after),
    questions: compareFields(questionFields, before, after),
  };
}
