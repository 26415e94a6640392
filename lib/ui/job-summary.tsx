import type { Job } from '@/shared/schemas/jobs';
import { Card } from './card';
import { FieldList } from './field-list';
import { foundationLabels, roofTypeLabels } from './job-labels';

const notSet = 'Not entered';

/** The job's entered facts, read-only. */
export function JobSummary({ job }: { job: Job }) {
  return (
    <Card title="Job details" testID="job-summary">
      <FieldList
        items={[
          { label: 'Address', value: job.address || notSet },
          { label: 'Year built', value: job.yearBuilt === null ? 'Not known' : String(job.yearBuilt) },
          { label: 'Stories', value: String(job.stories) },
          { label: 'Foundation', value: foundationLabels[job.foundation] },
          { label: 'Roof', value: `${roofTypeLabels[job.roofType]}, ${job.roofPitchIn12} in 12` },
          {
            label: 'Building width',
            value: job.buildingWidthFt === null ? notSet : `${job.buildingWidthFt} ft`,
          },
          { label: 'Load standard', value: job.loadStandard },
          { label: 'Ground snow', value: `${job.groundSnowPsf} psf` },
          { label: 'Ground snow source', value: job.groundSnowSource || notSet },
          { label: 'Notes', value: job.notes || 'None' },
        ]}
      />
    </Card>
  );
}
