import { count } from 'drizzle-orm';
import type { Db } from './client';
import { newId } from './new-id';
import { insertDemoChain, type RefreshLoadPath } from './seed-load-path';
import { insertDemoMembers, type EvaluateMember } from './seed-members';
import { jobs, memberships, organizations, priceBookSettings, priceItems, users } from './schema';
import { DEMO_PRICES, DEMO_STALE_AFTER_DAYS } from './demo-prices';
import type { OrgKind, Role } from '@/shared/schemas/auth';
import type { jobInputSchema } from '@/shared/schemas/jobs';
import type { z } from 'zod';

/** Every demo login uses this password (listed in the README). */
export const DEMO_PASSWORD = 'tributary-demo';

interface DemoPerson {
  email: string;
  name: string;
  role: Role;
}

interface DemoFirm {
  name: string;
  kind: OrgKind;
  people: DemoPerson[];
  jobs: z.output<typeof jobInputSchema>[];
}

const SNOW_SOURCE = 'Demo value: look up the site in the ASCE Hazard Tool or ask the building department';

/** An invented scenario: every firm, person, address and number here is made up for the demo. */
const DEMO_FIRMS: DemoFirm[] = [
  {
    name: 'Kestrel Bend Remodeling (demo)',
    kind: 'contracting',
    people: [
      { email: 'owner@demo.tributary.test', name: 'Maren Quillby', role: 'owner' },
      { email: 'contractor@demo.tributary.test', name: 'Dario Fenwick', role: 'contractor' },
      { email: 'estimator@demo.tributary.test', name: 'Ines Thornquist', role: 'estimator' },
    ],
    jobs: [
      {
        name: 'Ranch dining-room opening',
        address: '418 Larkmoor Lane, Demo Falls',
        yearBuilt: 1957,
        stories: 1,
        roofType: 'gable',
        roofPitchIn12: 4,
        buildingWidthFt: 28,
        adoptedCode: 'IRC 2024',
        loadStandard: 'ASCE 7-22',
        groundSnowPsf: 25,
        groundSnowSource: SNOW_SOURCE,
        foundation: 'crawlspace',
        notes:
          'Open 14 ft of the wall between the dining room and the living room. Ceiling joists lap over the wall; rafters meet a ridge board.',
      },
      {
        name: 'Bungalow hall doorway',
        address: '73 Ashgrove Court, Demo Falls',
        yearBuilt: 1924,
        stories: 1,
        roofType: 'gable',
        roofPitchIn12: 9,
        buildingWidthFt: 24,
        adoptedCode: 'IRC 2018',
        loadStandard: 'ASCE 7-16',
        groundSnowPsf: 30,
        groundSnowSource: SNOW_SOURCE,
        foundation: 'basement',
        notes: 'Widen the hall doorway to 5 ft. Plaster walls; built before 1978, plan lead-safe work.',
      },
      {
        name: 'Split-level family room wall',
        address: '1290 Pinnacle Rise, Demo Falls',
        yearBuilt: 1968,
        stories: 2,
        roofType: 'hip',
        roofPitchIn12: 5,
        buildingWidthFt: 30,
        adoptedCode: null,
        loadStandard: 'ASCE 7-22',
        groundSnowPsf: 20,
        groundSnowSource: SNOW_SOURCE,
        foundation: 'slab',
        notes: 'Take out the wall between family room and den; a post above may land on it. Check the attic.',
      },
    ],
  },
  {
    name: 'Trueline Structural Design (demo)',
    kind: 'engineering',
    people: [{ email: 'engineer@demo.tributary.test', name: 'Oren Vasquez-Hale, PE', role: 'engineer' }],
    jobs: [],
  },
];

/**
 * Adds the demo firms, people and jobs when the database has no users yet; otherwise does nothing.
 * `hashPassword` comes from the server's password module (the database layer does not import the server),
 * and so does `evaluateMember`, the members service's own check: with it the demo jobs get their demo
 * headers and beams (db/seed-members.ts), computed by the engine as a save would; `refreshLoadPath`, the
 * load path service's own, adds the demo chain (db/seed-load-path.ts) and each member's load path state.
 * Returns true when it added the demo data.
 */
export async function insertDemoData(
  db: Db,
  hashPassword: (password: string) => Promise<string>,
  evaluateMember?: EvaluateMember,
  refreshLoadPath?: RefreshLoadPath,
): Promise<boolean> {
  const [{ users: existing }] = db.select({ users: count() }).from(users).all();
  if (existing > 0) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const base = Date.now();
  const at = (offsetMs: number) => new Date(base + offsetMs).toISOString();
  db.transaction((tx) => {
    DEMO_FIRMS.forEach((firm, firmIndex) => {
      const orgId = newId();
      tx.insert(organizations)
        .values({ id: orgId, name: firm.name, kind: firm.kind, createdAt: at(firmIndex) })
        .run();
      const userIds = firm.people.map(() => newId());
      firm.people.forEach((person, personIndex) => {
        const userId = userIds[personIndex];
        const createdAt = at(firmIndex * 100 + personIndex);
        tx.insert(users)
          .values({
            id: userId,
            email: person.email,
            name: person.name,
            passwordHash,
            createdAt,
            emailVerifiedAt: createdAt,
          })
          .run();
        tx.insert(memberships).values({ id: newId(), userId, orgId, role: person.role, createdAt }).run();
      });
      if (firm.kind === 'contracting') {
        // Invented demo prices (db/demo-prices.ts), set by the demo owner.
        const setAt = at(500);
        for (const [key, amount] of DEMO_PRICES)
          tx.insert(priceItems)
            .values({
              id: newId(),
              orgId,
              key,
              amount,
              note: 'Invented demo price',
              setAt,
              setBy: userIds[0],
            })
            .run();
        tx.insert(priceBookSettings)
          .values({ orgId, staleAfterDays: DEMO_STALE_AFTER_DAYS, updatedAt: setAt, updatedBy: userIds[0] })
          .run();
      }
      firm.jobs.forEach((job, jobIndex) => {
        const createdAt = at(1000 + jobIndex);
        const row = {
          id: newId(),
          orgId,
          ...job,
          createdAt,
          updatedAt: createdAt,
          archivedAt: null,
          version: 1,
        };
        tx.insert(jobs)
          .values({ ...row, createdBy: userIds[0] })
          .run();
        if (evaluateMember) insertDemoMembers(tx, row, userIds[1] ?? userIds[0], evaluateMember);
        // The demo chain (db/seed-load-path.ts) and every member's state on its job's load path.
        if (evaluateMember && refreshLoadPath)
          insertDemoChain(tx, row, userIds[1] ?? userIds[0], refreshLoadPath);
      });
    });
  });
  return true;
}
