import type { Job } from '@/shared/schemas/jobs';
import type { FoundationType, RoofType } from './job-draft';

export const roofTypeLabels: Record<RoofType, string> = {
  gable: 'Gable',
  hip: 'Hip',
  shed: 'Shed',
  flat: 'Flat',
  gambrel: 'Gambrel',
  other: 'Other',
};

export const foundationLabels: Record<FoundationType, string> = {
  slab: 'Slab on grade',
  crawlspace: 'Crawlspace',
  basement: 'Basement',
  pier: 'Piers',
  unknown: 'Not known yet',
};

/** "Built 1962" or "Year built not known". */
export function yearBuiltLabel(job: Pick<Job, 'yearBuilt'>): string {
  return job.yearBuilt === null ? 'Year built not known' : `Built ${job.yearBuilt}`;
}
