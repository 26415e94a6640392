import type { ScreenQuestionId } from '@/shared/schemas/bearing-screen-answers';

export type QuestionCopy = {
  /** The question as asked. */
  prompt: string;
  /** What to look for, beside the drawing. */
  help: string;
  /** Each known value's label, in the order shown; "Not sure — I can't see" is always added. */
  options: { value: string; label: string; description?: string }[];
  /** Marked a trap: it makes a bearing wall look nonbearing. */
  trap?: boolean;
};

const yes = (label: string, description?: string) => ({ value: 'yes', label, description });
const no = (label: string, description?: string) => ({ value: 'no', label, description });

/** The questions in the order a person walks them: the room, the attic or floor above, then below. */
export const QUESTION_ORDER: ScreenQuestionId[] = [
  'exterior',
  'above',
  'joistDirection',
  'furring',
  'joistsLand',
  'joistLaps',
  'joistsContinuous',
  'beamAbove',
  'hiddenPost',
  'wallAbove',
  'balloonFraming',
  'ridge',
  'ceilingJoistsTie',
  'trusses',
  'purlinBraces',
  'bracedWall',
  'below',
  'sag',
];

export const QUESTION_COPY: Record<ScreenQuestionId, QuestionCopy> = {
  exterior: {
    prompt: 'Is this an outside wall of the house?',
    help: 'Siding, brick or stucco on its far face means an exterior wall.',
    options: [yes('Yes, an exterior wall'), no('No, an interior wall')],
  },
  above: {
    prompt: 'What is directly above this wall’s ceiling?',
    help: 'Look from the attic hatch, or go up the stairs and find the same line.',
    options: [
      { value: 'attic', label: 'An attic', description: 'Roof framing above the ceiling' },
      { value: 'floor', label: 'Another floor', description: 'Rooms above this one' },
    ],
  },
  joistDirection: {
    prompt: 'Which way do the joists above run?',
    help: 'Ceiling joists under an attic, floor joists under a floor above. Across means they cross the wall’s line.',
    options: [
      { value: 'across', label: 'Across the wall' },
      { value: 'parallel', label: 'Parallel to the wall' },
    ],
  },
  furring: {
    prompt: 'Is there furring or strapping under the ceiling?',
    help: 'Strips (1x3 or 1x4) nailed across the joists. Their screw lines run across the joists, not with them.',
    options: [yes('Yes, furring strips'), no('No furring')],
    trap: true,
  },
  joistsLand: {
    prompt: 'Do joists end on this wall’s top plate?',
    help: 'Clear the insulation off the plate in the attic, or look through a hole at the top of the wall.',
    options: [yes('Yes, joists end on it'), no('No joist ends on it')],
  },
  joistLaps: {
    prompt: 'Are joists lapped or spliced over this wall?',
    help: 'Two joists side by side overlapping on the plate, or a plate or block joining two ends.',
    options: [yes('Yes, laps or splices'), no('No laps or splices')],
  },
  joistsContinuous: {
    prompt: 'Do joists run unbroken over the wall and touch its top plate?',
    help: 'They do not land on it, but resting on it they bear on it — and carry more than half their span to it.',
    options: [yes('Yes, they rest on it'), no('No, they clear it', 'A gap between joists and plate')],
    trap: true,
  },
  beamAbove: {
    prompt: 'Is there a beam, girder, post or strongback above that bears on this wall?',
    help: 'Doubled or tripled joists, a beam in the attic floor, a post, or a board on edge across the joists.',
    options: [yes('Yes, one bears on it'), no('None')],
  },
  hiddenPost: {
    prompt: 'Is a post or a stud pack hidden inside the wall?',
    help: 'Three or more studs nailed together, or a solid post, often under a beam end above. Look behind an outlet cover.',
    options: [yes('Yes, a post or stud pack'), no('No, single studs')],
    trap: true,
  },
  wallAbove: {
    prompt: 'Is a wall stacked directly above this one?',
    help: 'On the floor above (or a short wall in the attic), standing right over this wall’s line.',
    options: [yes('Yes, a wall above'), no('No wall above')],
  },
  balloonFraming: {
    prompt: 'Do the studs run past the floor line (balloon framing)?',
    help: 'In older houses the studs run from sill to roof and the floor joists are nailed to them or sit on a ribbon.',
    options: [yes('Yes, studs run past the floor'), no('No, studs stop at the floor')],
    trap: true,
  },
  ridge: {
    prompt: 'What do the rafters meet at the top?',
    help: 'A ridge board is a single board about as deep as the rafters’ cut. A ridge beam is deeper or doubled, on posts.',
    options: [
      { value: 'board', label: 'A ridge board' },
      { value: 'beam', label: 'A ridge beam' },
      { value: 'none', label: 'No ridge', description: 'Trusses, a flat or a shed roof' },
    ],
  },
  ceilingJoistsTie: {
    prompt: 'Do ceiling joists run with the rafters and lap or splice over this wall?',
    help: 'Ceiling joists parallel to the rafters, nailed to them at the outside walls, tie the rafters together. Cutting them lets the walls spread.',
    options: [yes('Yes, lapped or spliced here'), no('No')],
  },
  trusses: {
    prompt: 'Is the roof framed with trusses — and is one a girder truss or bearing on this wall?',
    help: 'A girder truss has several plies and hangers holding other trusses. A tag or drawing may mark a bearing over this wall.',
    options: [
      { value: 'none', label: 'No trusses', description: 'Rafters' },
      { value: 'clear-span', label: 'Trusses, clear span', description: 'Outside wall to outside wall' },
      {
        value: 'girder-or-interior-bearing',
        label: 'Girder truss or bearing here',
        description: 'A girder truss, or a bearing marked on this wall',
      },
    ],
    trap: true,
  },
  purlinBraces: {
    prompt: 'Do purlin braces or struts land on this wall?',
    help: 'A purlin runs under the rafters, across them. Its braces slope down to a wall plate.',
    options: [yes('Yes, braces land on it'), no('No braces land on it')],
  },
  bracedWall: {
    prompt: 'Is this a braced wall panel or a shear wall?',
    help: 'Plywood or OSB under the finish, a diagonal board let into the studs, metal hold-downs at its ends.',
    options: [yes('Yes, it is braced'), no('No bracing')],
  },
  below: {
    prompt: 'What is directly below this wall?',
    help: 'In the basement or crawl space, measure from an outside wall to find this wall’s line.',
    options: [
      { value: 'beam', label: 'A beam or girder' },
      { value: 'wall', label: 'A wall' },
      { value: 'footing', label: 'A footing, piers or foundation wall' },
      { value: 'slab', label: 'A slab', description: 'Cannot see under it' },
      { value: 'joists-only', label: 'Only floor joists', description: 'Nothing built to carry it' },
    ],
  },
  sag: {
    prompt: 'Has anything above sagged or cracked?',
    help: 'A dip in the ceiling across the wall, cracks along it or over doors, doors upstairs that stick.',
    options: [yes('Yes, sag or cracks'), no('No sag, no cracks')],
  },
};
