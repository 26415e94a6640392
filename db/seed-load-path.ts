import { and, eq } from 'drizzle-orm';
import type { LoadPathBearing, LoadPathElementData } from '@/shared/schemas/calc/load-path';
import type { Job } from '@/shared/schemas/jobs';
import type { DbOrTx } from './client';
import { newId } from './new-id';
import { loadPathBearings, loadPathElements, members } from './schema';

/** Checks a job's load path again and writes each member's state on it (the load path service's own). */
export type RefreshLoadPath = (tx: DbOrTx, job: Job) => void;

interface DemoElement {
  key: string;
  label: string;
  element: LoadPathElementData;
}
interface DemoBearing extends Omit<LoadPathBearing, 'ontoId'> {
  /** A demo member's label or a demo element's key. */
  from: string;
  onto: string;
}

/**
 * An invented demo chain by job name: the family-room beam's left end on jack studs in the den wall over the
 * foundation wall, its right end on a 6x6 post through the floor on squash blocks down to a new pad the
 * contractor has not yet confirmed, so the demo shows "load path open" with its reason.
 */
export const DEMO_CHAINS: Record<string, { elements: DemoElement[]; bearings: DemoBearing[] }> = {
  'Split-level family room wall': {
    elements: [
      {
        key: 'jacks',
        label: 'Jack studs in the den wall',
        element: {
          kind: 'wall',
          studMaterialId: 'sawn-spruce-pine-fir-no1-no2',
          studSizeId: '2x6',
          jackStuds: 3,
          heightFt: 8,
          flags: { heightFt: 'measured' },
        },
      },
      {
        key: 'fw',
        label: 'Foundation wall under the den',
        element: { kind: 'foundation-wall', confirmed: true },
      },
      {
        key: 'post',
        label: 'Post by the stair',
        element: {
          kind: 'post',
          materialId: 'sawn-douglas-fir-larch-no2',
          sizeId: '6x6',
          heightFt: 8,
          gradeUnknown: true,
        },
      },
      {
        key: 'pad',
        label: 'New pad in the basement',
        element: { kind: 'footing', data: { footing: 'new-pad', confirmed: false } },
      },
    ],
    bearings: [
      { from: 'Family room beam', end: 'left', onto: 'jacks' },
      { from: 'Family room beam', end: 'right', onto: 'post' },
      { from: 'jacks', end: 'bottom', onto: 'fw', through: 'solid-blocking' },
      { from: 'post', end: 'bottom', onto: 'pad', through: 'squash-blocks' },
    ],
  },
};

/** Adds a demo job's chain (after its members), then checks its load path as a save would. */
export function insertDemoChain(tx: DbOrTx, job: Job, userId: string, refresh: RefreshLoadPath): void {
  const chain = DEMO_CHAINS[job.name];
  if (chain) {
    const ids = new Map<string, string>();
    for (const m of tx
      .select({ id: members.id, label: members.label })
      .from(members)
      .where(and(eq(members.jobId, job.id), eq(members.orgId, job.orgId)))
      .all())
      ids.set(m.label, m.id);
    for (const e of chain.elements) {
      const id = newId();
      ids.set(e.key, id);
      tx.insert(loadPathElements)
        .values({
          id,
          jobId: job.id,
          orgId: job.orgId,
          kind: e.element.kind,
          label: e.label,
          element: e.element,
          createdBy: userId,
          createdAt: job.createdAt,
          updatedAt: job.createdAt,
        })
        .run();
    }
    for (const { from, onto, ...b } of chain.bearings) {
      tx.insert(loadPathBearings)
        .values({
          id: newId(),
          jobId: job.id,
          orgId: job.orgId,
          fromId: ids.get(from) as string,
          ontoId: ids.get(onto) as string,
          end: b.end,
          atFt: b.atFt ?? null,
          hanger: b.hanger ?? null,
          through: b.through ?? null,
          joistRelation: b.joistRelation ?? null,
          updatedAt: job.createdAt,
        })
        .run();
    }
  }
  refresh(tx, job);
}
