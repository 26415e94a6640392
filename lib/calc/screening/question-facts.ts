import type { ScreenQuestionId } from '@/shared/schemas/bearing-screen-answers';
import { SCREEN_SOURCES } from './sources';

/**
 * What each answer of the bearing screen means:
 * - `engineer`: the wall goes to an engineer, never "nonbearing";
 * - `bearing`: a sign that the wall carries load;
 * - `clear`: this question does not point to load.
 */
export type FindingKind = 'engineer' | 'bearing' | 'clear';

/** The screen's questions and the roof-thrust check the screen derives from the ridge and the ceiling joists. */
export type ScreenTopic = ScreenQuestionId | 'roofThrust';

export interface Finding {
  kind: FindingKind;
  text: string;
  source: string;
}

export interface QuestionFacts {
  /** Short name of the question, used in reasons. */
  title: string;
  /** What to go and look at, and where to open an inspection hole, when the answer is not seen. */
  lookAt: string;
  /** Engineer-class questions: "not sure" on them can never end in "likely bearing" or "nonbearing". */
  danger: boolean;
  /** What each known value means. */
  findings: Record<string, Finding>;
}

const C = SCREEN_SOURCES.commonPractice;
const clear = (text: string, source: string = C): Finding => ({ kind: 'clear', text, source });
const bearing = (text: string, source: string = C): Finding => ({ kind: 'bearing', text, source });
const engineer = (text: string, source: string = C): Finding => ({ kind: 'engineer', text, source });

/**
 * Every question's findings and where to look. Reference: IRC 2021 R602.10, R802.4.5, R802.5.2, R802.10
 * (see sources.ts); AWC Design Aid No. 6; common practice.
 */
export const QUESTION_FACTS: Record<ScreenQuestionId, QuestionFacts> = {
  exterior: {
    title: 'Exterior wall',
    danger: false,
    lookAt:
      'Check from outside whether this wall is on the outside line of the house (siding on its far face).',
    findings: {
      yes: bearing(
        'It is an exterior wall: exterior walls carry the roof or the edge of a floor, and are braced wall lines in most houses.',
        `${SCREEN_SOURCES.bracedWalls}; ${C}`,
      ),
      no: clear('It is an interior wall.'),
    },
  },
  above: {
    title: 'What is above the wall',
    danger: false,
    lookAt:
      'Find out what is over the wall: look from the attic hatch, or go up the stairs and find the same line on the floor above.',
    findings: {
      attic: clear('An attic (the roof framing) is above the wall.'),
      floor: clear('Another floor is above the wall.'),
    },
  },
  joistDirection: {
    title: 'Joist direction',
    danger: false,
    lookAt:
      'Look at the joists themselves: from the attic, or through a small hole in the ceiling about a foot out from the wall. Do not go by screw lines or cracks on the ceiling.',
    findings: {
      across: clear('The joists above run across the wall.'),
      parallel: clear('The joists above run parallel to the wall.'),
    },
  },
  furring: {
    title: 'Furring or strapping under the ceiling',
    danger: false,
    lookAt:
      'Take down a light fixture or a register near the wall, or cut a 4 in hole: strips (1x3 or 1x4) under the joists are furring.',
    findings: {
      yes: clear(
        'The ceiling is furred: its screw lines follow the furring strips, which run across the joists, so they show the opposite of the joist direction.',
      ),
      no: clear('No furring or strapping under the ceiling.'),
    },
  },
  joistsLand: {
    title: 'Joists landing on the wall',
    danger: false,
    lookAt:
      'In the attic over the wall (or through a hole at the top of the wall), clear the insulation off the top plate along a few joists and see whether joists end on it.',
    findings: {
      yes: bearing('Joists end (land) on this wall’s top plate: the wall carries them.'),
      no: clear('No joists end on this wall.'),
    },
  },
  joistLaps: {
    title: 'Joist laps or splices over the wall',
    danger: false,
    lookAt:
      'At the same place: look for two joists side by side overlapping on the plate, or a splice plate or block joining two joist ends over the wall.',
    findings: {
      yes: bearing('Joists are lapped or spliced over this wall: they bear on it.'),
      no: clear('No joist laps or splices over this wall.'),
    },
  },
  joistsContinuous: {
    title: 'Joists continuous over the wall',
    danger: false,
    lookAt:
      'Look along the top plate for joists passing over it unbroken, and whether they touch the plate or clear it with a gap.',
    findings: {
      yes: bearing(
        'Joists run unbroken over the wall and rest on it: they do not land on it, but they bear on it, and continuous joists put more than their half-span load on a middle support (1.25 wL for two equal spans).',
        `${SCREEN_SOURCES.continuousJoists}; ${C}`,
      ),
      no: clear('Joists crossing the wall clear its top plate.'),
    },
  },
  beamAbove: {
    title: 'Beam, girder, post or strongback above',
    danger: true,
    lookAt:
      'Along the wall line in the attic or on the floor above, look for a beam, doubled or tripled joists, a post, or a strongback (a board on edge across the joists), and where each one ends.',
    findings: {
      yes: engineer(
        'A beam, girder, post or strongback above bears on this wall: its load comes down as a point load.',
      ),
      no: clear('No beam, girder, post or strongback above bears on the wall.'),
    },
  },
  hiddenPost: {
    title: 'Post or stud pack hidden in the wall',
    danger: true,
    lookAt:
      'Open the wall where a beam or post above would come down and at both ends: take off a switch or outlet cover or cut a small hole near the top, and look for three or more studs nailed together or a solid post.',
    findings: {
      yes: engineer(
        'A post or king-stud pack is hidden in the wall: it carries a point load from above, down to a footing.',
      ),
      no: clear('No post or stud pack hidden in the wall.'),
    },
  },
  purlinBraces: {
    title: 'Purlin braces or struts',
    danger: true,
    lookAt:
      'In the attic, follow each purlin (a board under the rafters, running across them) and its braces down: see whether a brace or strut lands on this wall’s top plate.',
    findings: {
      yes: engineer(
        'Purlin braces or struts land on this wall: they bring roof load down onto it.',
        SCREEN_SOURCES.purlins,
      ),
      no: clear('No purlin braces or struts land on the wall.', SCREEN_SOURCES.purlins),
    },
  },
  wallAbove: {
    title: 'Wall stacked above',
    danger: false,
    lookAt:
      'On the floor above, measure from an outside wall to find this wall’s line: is another wall standing right over it?',
    findings: {
      yes: bearing('A wall is stacked directly above: walls over walls usually carry a line of load down.'),
      no: clear('No wall is stacked above.'),
    },
  },
  below: {
    title: 'What is below the wall',
    danger: false,
    lookAt:
      'In the basement or crawl space, measure from the same outside wall to find the line under this wall: is there a beam, girder, wall, piers or a footing?',
    findings: {
      beam: bearing('A beam or girder runs directly under the wall: the wall sits on a bearing line.'),
      wall: bearing('A wall runs directly under it: the wall sits on a bearing line.'),
      footing: bearing(
        'A footing, foundation wall or piers are directly under it: the wall sits on a bearing line.',
      ),
      slab: clear(
        'The wall stands on a slab: a thickened footing under a bearing wall cannot be seen, so the slab decides nothing either way.',
      ),
      'joists-only': clear('Only floor joists are under the wall: nothing below was built to carry it.'),
    },
  },
  ridge: {
    title: 'Ridge board or ridge beam',
    danger: false,
    lookAt:
      'At the top of the attic: a ridge board is a single 1x or 2x about as deep as the rafters’ cut ends; a ridge beam is deeper or doubled and sits on posts at its ends.',
    findings: {
      board: clear('The rafters meet a ridge board (not a beam).', SCREEN_SOURCES.rafterTies),
      beam: clear(
        'The rafters meet a ridge beam, which carries the top of the rafters.',
        SCREEN_SOURCES.rafterTies,
      ),
      none: clear('There is no ridge (trusses, a flat or a shed roof).'),
    },
  },
  ceilingJoistsTie: {
    title: 'Ceiling joists tying the rafters',
    danger: false,
    lookAt:
      'In the attic: do the ceiling joists run the same way as the rafters, nailed to them at the outside walls, and do they lap or splice over this wall?',
    findings: {
      yes: bearing(
        'Ceiling joists run parallel to the rafters and are lapped or spliced over this wall: they bear on it.',
        SCREEN_SOURCES.rafterTies,
      ),
      no: clear(
        'The ceiling joists do not run with the rafters lapped over this wall.',
        SCREEN_SOURCES.rafterTies,
      ),
    },
  },
  trusses: {
    title: 'Trusses: girder truss or interior bearing',
    danger: true,
    lookAt:
      'In the attic: look for a truss of several plies nailed or bolted together (a girder truss), hangers holding other trusses, or a truss tag or drawing that marks a bearing over this wall.',
    findings: {
      none: clear('The roof is framed with rafters, not trusses.'),
      'clear-span': clear(
        'Trusses span from outside wall to outside wall, with no girder truss and no bearing marked over this wall.',
        SCREEN_SOURCES.trusses,
      ),
      'girder-or-interior-bearing': engineer(
        'A girder truss, or trusses designed with a bearing point on this wall: their load and their design depend on it.',
        SCREEN_SOURCES.trusses,
      ),
    },
  },
  balloonFraming: {
    title: 'Balloon framing',
    danger: false,
    lookAt:
      'In the basement at the sill, or through a hole at the floor line: do the studs run past the floor, with the joists nailed to them or resting on a board let into them?',
    findings: {
      yes: bearing(
        'Balloon framing: the studs run past the floor line and the floor joists hang on them (a ribbon let into the studs), so the wall carries the floor even where no joist lands on a plate.',
      ),
      no: clear('Platform framing: the studs stop at the floor.'),
    },
  },
  bracedWall: {
    title: 'Braced wall panel or shear wall',
    danger: true,
    lookAt:
      'Look at the wall from an opening or behind an outlet cover: plywood or OSB under the finish, a diagonal board let into the studs, metal hold-downs at the ends, or plans that mark it a braced wall.',
    findings: {
      yes: engineer(
        'It is a braced wall panel or shear wall: it resists wind and earthquake racking, and cutting it takes bracing out of the house.',
        SCREEN_SOURCES.bracedWalls,
      ),
      no: clear('No structural sheathing, hold-downs or let-in brace.', SCREEN_SOURCES.bracedWalls),
    },
  },
  sag: {
    title: 'Sag or cracks above',
    danger: true,
    lookAt:
      'Hold a straightedge or a string along the ceiling across the wall; look for cracks along the wall line and over doors, and doors upstairs that stick.',
    findings: {
      yes: engineer(
        'Something above has sagged or cracked: the framing is already overloaded or moving, and that needs an engineer’s eyes.',
      ),
      no: clear('No sag or cracks above.'),
    },
  },
};

/** The roof-thrust check: the rafters meet a ridge board and ceiling joists lapped over this wall tie them. */
export const ROOF_THRUST = {
  title: 'Roof thrust',
  lookAt: QUESTION_FACTS.ridge.lookAt,
  finding: engineer(
    'Roof thrust: the rafters meet a ridge board and the ceiling joists lapped or spliced over this wall tie them; cutting those joists lets the rafters push the outside walls apart.',
    SCREEN_SOURCES.rafterTies,
  ),
  unknownText:
    'Not ruled out. It depends on whether the rafters meet a ridge board and whether the ceiling joists lapped over this wall tie them.',
} as const;
