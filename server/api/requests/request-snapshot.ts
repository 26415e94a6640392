import type { DbOrTx } from '@/db/client';
import { ENGINE_VERSION, chainBelow } from '@/lib/calc';
import { evaluateJob } from '@/server/api/load-path/load-path.service';
import type { LoadPathResult } from '@/shared/schemas/calc/load-path';
import { AppError, notFound } from '@/server/app-error';
import { findJob } from '@/server/api/jobs/jobs.repository';
import { findUser } from '@/server/api/me/me.repository';
import { findMember } from '@/server/api/members/members.repository';
import { findOrganization } from '@/server/api/orgs/orgs.repository';
import type {
  RequestSnapshot,
  SnapshotLoadPathStep,
  SnapshotMember,
} from '@/shared/schemas/requests/snapshot';
import { listAttachments, type RequestRow } from './requests.repository';

/** The chain under a member as the package carries it: every step's load, check, reasons and assumptions. */
function loadPathSteps(result: LoadPathResult, memberId: string): SnapshotLoadPathStep[] {
  const labelOf = new Map(result.elements.map((e) => [e.id, e.label]));
  return chainBelow(result, memberId).map(({ element: e, depth }) => ({
    id: e.id,
    label: e.label,
    kind: e.kind,
    depth,
    state: e.state,
    closed: e.closed,
    incoming: e.incoming.map((i) => ({ fromLabel: i.fromLabel, atFt: i.atFt, load: i.load })),
    governing: e.memberResult
      ? {
          check: e.memberResult.governing.check,
          ratio: e.memberResult.governing.ratio,
          combination: e.memberResult.governing.combination ?? '',
        }
      : null,
    checks: e.checks,
    ends: e.ends.map((end) => ({
      end: end.end,
      ontoId: end.ontoId ?? null,
      ontoLabel: end.ontoId ? (labelOf.get(end.ontoId) ?? null) : null,
      load: end.load,
      governingLb: end.governingLb,
      governingCombination: end.governingCombination,
    })),
    pad: e.pad,
    openReasons: e.openReasons,
    engineerReasons: e.engineerReasons,
    assumptions: e.assumptions,
    warnings: e.warnings,
  }));
}

/**
 * Freezes what version `version` of the request sends: the job and its members as they are now (inputs
 * with their flags, the server's stored results), the composed parts of the working copy and the photo
 * list. Refuses, naming the fields, a copy that cannot be sent yet.
 */
export function buildSnapshot(tx: DbOrTx, row: RequestRow, sentBy: string, version: number): RequestSnapshot {
  const draft = row.draft;
  const fields: Record<string, string[]> = {};
  if (!draft.engineerEmail) fields.engineerEmail = ['Enter the engineer’s e-mail address'];
  if (draft.memberIds.length === 0) fields.memberIds = ['Pick at least one member'];
  if (!draft.jurisdiction.state) fields['jurisdiction.state'] = ['Pick the state the house is in'];
  const job = findJob(tx, row.orgId, row.jobId);
  if (!job) throw notFound('Job');
  const loadPath = evaluateJob(tx, row.orgId, job, () => 'memberIds').result;
  const members: SnapshotMember[] = [];
  draft.memberIds.forEach((memberId, index) => {
    const member = findMember(tx, row.orgId, memberId);
    if (!member || member.jobId !== row.jobId) {
      fields[`memberIds.${index}`] = ['This member is not on the job any more'];
      return;
    }
    members.push({
      id: member.id,
      kind: member.kind,
      label: member.label,
      wall: member.wall,
      input: member.input,
      summary: member.summary,
      result: member.result,
      prescriptive: member.prescriptive,
      engineVersion: member.engineVersion,
      loadPath: loadPathSteps(loadPath, member.id),
    });
  });
  if (Object.keys(fields).length > 0) {
    throw new AppError('bad_request', 'The request is not ready to send', fields);
  }
  const contractor = findUser(tx, sentBy);
  const { id: _id, orgId: _orgId, createdAt: _c, updatedAt: _u, archivedAt: _a, ...jobFields } = job;
  return {
    number: row.number,
    version,
    sentAt: new Date().toISOString(),
    firm: { name: findOrganization(tx, row.orgId)?.name ?? '' },
    contractor: { name: contractor?.name ?? '', email: contractor?.email ?? '' },
    engineerEmail: draft.engineerEmail ?? '',
    job: { id: job.id, ...jobFields },
    jurisdiction: draft.jurisdiction,
    conditions: draft.conditions,
    constraints: draft.constraints,
    phoneBack: draft.phoneBack,
    questions: draft.questions,
    members,
    engineVersion: ENGINE_VERSION,
    files: listAttachments(tx, row.id)
      .filter((file) => file.purpose === 'photo')
      .map((file) => ({
        id: file.id,
        place: file.place,
        caption: file.caption,
        fileName: file.fileName,
        mimeType: file.mimeType,
        sizeBytes: file.sizeBytes,
        sha256: file.sha256,
      })),
  };
}
