import { describe, expect, it } from 'vitest';
import { CAUTION_TEXT, applicableQuestions, screenWall, type ScreenResult } from '@/lib/calc';
import {
  screenAnswersSchema,
  type ScreenAnswers,
  type ScreenQuestionId,
} from '@/shared/schemas/bearing-screen-answers';

const seen = <V extends string>(value: V) => ({ value, basis: 'seen' as const });
const assumed = <V extends string>(value: V) => ({ value, basis: 'assumed' as const });
const unsure = { value: 'unsure' as const };

/**
 * An interior wall under an attic, every answer seen and none pointing to load: ceiling joists parallel
 * to it (seen from the attic), no furring, nothing above or below it, a ridge board with ceiling joists that
 * do not lap over it. (Invented example wall.)
 */
const NONBEARING: ScreenAnswers = {
  exterior: seen('no'),
  above: seen('attic'),
  joistDirection: { ...seen('parallel'), from: 'above' },
  furring: seen('no'),
  beamAbove: seen('no'),
  hiddenPost: seen('no'),
  purlinBraces: seen('no'),
  wallAbove: seen('no'),
  below: seen('joists-only'),
  ridge: seen('board'),
  ceilingJoistsTie: seen('no'),
  bracedWall: seen('no'),
  sag: seen('no'),
};

const screen = (change: Partial<ScreenAnswers> = {}, base: ScreenAnswers = NONBEARING): ScreenResult =>
  screenWall(screenAnswersSchema.parse({ ...base, ...change }));

const topics = (looks: { topic: string }[]) => looks.map((l) => l.topic);
const reasonOf = (result: ScreenResult, topic: string) => result.reasons.find((r) => r.topic === topic);

describe('likely nonbearing: only when every deciding answer was seen', () => {
  it('gives likely nonbearing with a clear, seen reason for every question that applies', () => {
    const result = screen();
    expect(result.outcome).toBe('likely-nonbearing');
    expect(result.lookAt).toEqual([]);
    expect(result.engineerReasons).toEqual([]);
    expect(result.reasons.every((r) => r.kind === 'clear' && r.basis === 'seen')).toBe(true);
    expect(topics(result.reasons).sort()).toEqual(Object.keys(NONBEARING).sort());
    expect(result.caution).toBe(CAUTION_TEXT);
  });

  const deciding = applicableQuestions(NONBEARING);

  it.each(deciding)('"%s" assumed instead of seen: can\'t tell yet, look there', (id) => {
    const answer = NONBEARING[id] as { value: string };
    const result = screen({ [id]: assumed(answer.value) });
    expect(result.outcome).toBe('cant-tell');
    expect(topics(result.lookAt)).toEqual([id]);
    expect(result.lookAt[0].why).toBe('Assumed, not seen.');
    expect(result.lookAt[0].where.length).toBeGreaterThan(20);
  });

  it.each(deciding)('"%s" answered "not sure — I can\'t see": can\'t tell yet, look there', (id) => {
    const result = screen({ [id]: unsure });
    expect(result.outcome).toBe('cant-tell');
    // An unsure ridge leaves trusses possible; unsure tying joists leave roof thrust open.
    const expected = { ridge: 'trusses', ceilingJoistsTie: 'roofThrust' }[id as string] ?? id;
    expect(topics(result.lookAt)).toContain(expected);
    expect(result.reasons.some((r) => r.kind === 'unknown')).toBe(true);
  });

  it.each(deciding)('"%s" not answered yet: can\'t tell yet', (id) => {
    const { [id]: _left, ...rest } = NONBEARING;
    const result = screenWall(rest);
    expect(result.outcome).toBe('cant-tell');
    expect(result.lookAt.length).toBeGreaterThan(0);
    const why = result.lookAt.map((l) => l.why).join(' ');
    expect(why).toMatch(id === 'ceilingJoistsTie' ? /Not ruled out/ : /Not answered yet\./);
  });

  it('an empty screen is "can\'t tell yet" with every engineer-class question to look at', () => {
    const result = screenWall({});
    expect(result.outcome).toBe('cant-tell');
    expect(topics(result.lookAt)).toEqual(
      expect.arrayContaining(['beamAbove', 'hiddenPost', 'purlinBraces', 'bracedWall', 'sag', 'roofThrust']),
    );
  });

  it('a slab below decides nothing: the wall can still screen nonbearing (common practice)', () => {
    expect(screen({ below: seen('slab') }).outcome).toBe('likely-nonbearing');
  });

  it('joists crossing the wall that neither land, lap, splice nor touch it: likely nonbearing', () => {
    const result = screen({
      joistDirection: { ...seen('across'), from: 'above' },
      joistsLand: seen('no'),
      joistLaps: seen('no'),
      joistsContinuous: seen('no'),
    });
    expect(result.outcome).toBe('likely-nonbearing');
  });

  it('joists crossing the wall: the landing questions decide, so leaving one out is "can\'t tell"', () => {
    const result = screen({ joistDirection: { ...seen('across'), from: 'above' }, joistsLand: seen('no') });
    expect(result.outcome).toBe('cant-tell');
    expect(topics(result.lookAt)).toEqual(['joistLaps', 'joistsContinuous']);
  });
});

describe('engineer required: the dangerous cases never give "nonbearing"', () => {
  const cases: [what: string, change: Partial<ScreenAnswers>, topic: string, source: RegExp][] = [
    [
      'roof thrust: ridge board, ceiling joists tying the rafters lapped over the wall',
      { ridge: seen('board'), ceilingJoistsTie: seen('yes') },
      'roofThrust',
      /IRC 2021 R802\.5\.2/,
    ],
    ['a braced wall panel or shear wall', { bracedWall: seen('yes') }, 'bracedWall', /IRC 2021 R602\.10/],
    ['purlin braces landing on the wall', { purlinBraces: seen('yes') }, 'purlinBraces', /R802\.4\.5/],
    ['a beam, girder, post or strongback above', { beamAbove: seen('yes') }, 'beamAbove', /Common practice/],
    ['a post hidden in the wall (trap)', { hiddenPost: seen('yes') }, 'hiddenPost', /Common practice/],
    ['sag or cracks above', { sag: seen('yes') }, 'sag', /Common practice/],
    [
      'a girder truss or a truss bearing on the wall (trap)',
      { ridge: seen('none'), trusses: seen('girder-or-interior-bearing') },
      'trusses',
      /IRC 2021 R802\.10/,
    ],
  ];

  it.each(cases)(
    '%s → engineer required, with that reason and its source',
    (_what, change, topic, source) => {
      const result = screen(change);
      expect(result.outcome).toBe('engineer-required');
      const reason = reasonOf(result, topic);
      expect(reason?.kind).toBe('engineer');
      expect(reason?.source).toMatch(source);
      expect(result.engineerReasons).toContain(reason?.text);
      expect(result.sources.some((s) => source.test(s))).toBe(true);
    },
  );

  it.each(cases)('%s, only assumed → still engineer required', (_what, change) => {
    const asAssumed = Object.fromEntries(
      Object.entries(change).map(([id, a]) => [id, assumed((a as { value: string }).value)]),
    );
    expect(screen(asAssumed).outcome).toBe('engineer-required');
  });

  it.each(cases)(
    '%s, with other answers unsure → engineer required wins over "can\'t tell"',
    (_w, change) => {
      expect(screen({ ...change, exterior: unsure, wallAbove: unsure }).outcome).toBe('engineer-required');
    },
  );

  it('roof thrust names the ceiling joists that tie the rafters', () => {
    const result = screen({ ridge: seen('board'), ceilingJoistsTie: seen('yes') });
    expect(reasonOf(result, 'roofThrust')?.text).toMatch(/ceiling joists .* tie them/);
    // The lapped joists also bear on the wall (IRC 2021 R802.5.2: lapped over bearing partitions).
    expect(reasonOf(result, 'ceilingJoistsTie')?.kind).toBe('bearing');
  });

  it('a ridge beam carries the rafters: lapped ceiling joists are a sign of load, not of thrust', () => {
    const result = screen({ ridge: seen('beam'), joistDirection: { ...seen('across'), from: 'above' } });
    expect(applicableQuestions({ ridge: seen('beam') })).not.toContain('ceilingJoistsTie');
    expect(reasonOf(result, 'roofThrust')).toBeUndefined();
  });

  it("tying joists lapped here but the ridge not seen → can't tell, look at the ridge", () => {
    const result = screen({ ridge: unsure, ceilingJoistsTie: seen('yes') });
    expect(result.outcome).toBe('cant-tell');
    const look = result.lookAt.find((l) => l.topic === 'roofThrust');
    expect(look?.where).toMatch(/ridge board/);
    // The lapped joists still show as a sign of load among the reasons.
    expect(reasonOf(result, 'ceilingJoistsTie')?.kind).toBe('bearing');
  });
});

describe('likely bearing', () => {
  const across = { joistDirection: { ...seen('across' as const), from: 'above' as const } };
  const landing = { ...across, joistsLand: seen('no'), joistLaps: seen('no'), joistsContinuous: seen('no') };
  const cases: [what: string, change: Partial<ScreenAnswers>, topic: ScreenQuestionId][] = [
    ['joists land on the wall', { ...landing, joistsLand: seen('yes') }, 'joistsLand'],
    ['joists lapped or spliced over it', { ...landing, joistLaps: seen('yes') }, 'joistLaps'],
    ['joists continuous over it (trap)', { ...landing, joistsContinuous: seen('yes') }, 'joistsContinuous'],
    ['a wall stacked above', { wallAbove: seen('yes') }, 'wallAbove'],
    ['a beam below', { below: seen('beam') }, 'below'],
    ['a wall below', { below: seen('wall') }, 'below'],
    ['a footing below', { below: seen('footing') }, 'below'],
    ['an exterior wall', { exterior: seen('yes') }, 'exterior'],
    [
      'balloon framing under a floor (trap)',
      { above: seen('floor'), balloonFraming: seen('yes') },
      'balloonFraming',
    ],
  ];

  it.each(cases)('%s → likely bearing with that reason', (_what, change, topic) => {
    const result = screen(change);
    expect(result.outcome).toBe('likely-bearing');
    expect(reasonOf(result, topic)?.kind).toBe('bearing');
    expect(result.lookAt).toEqual([]);
  });

  it.each(cases)('%s, assumed → still likely bearing (the safe side)', (_what, change, topic) => {
    const answer = change[topic] as { value: string };
    expect(screen({ ...change, [topic]: assumed(answer.value) }).outcome).toBe('likely-bearing');
  });

  it('continuous joists cite the 1.25 wL centre reaction (AWC Design Aid No. 6)', () => {
    const reason = reasonOf(screen({ ...landing, joistsContinuous: seen('yes') }), 'joistsContinuous');
    expect(reason?.text).toContain('1.25 wL');
    expect(reason?.source).toMatch(/AWC Design Aid No\. 6/);
  });

  it("a bearing wall with an engineer-class question unsure → can't tell, still saying it looks bearing", () => {
    const result = screen({ ...landing, joistsLand: seen('yes'), purlinBraces: unsure });
    expect(result.outcome).toBe('cant-tell');
    expect(topics(result.lookAt)).toEqual(['purlinBraces']);
    expect(reasonOf(result, 'joistsLand')?.kind).toBe('bearing');
  });

  it('a bearing wall with an engineer-class "no" only assumed → likely bearing, listed to confirm', () => {
    const result = screen({ ...landing, joistsLand: seen('yes'), bracedWall: assumed('no') });
    expect(result.outcome).toBe('likely-bearing');
    expect(topics(result.toConfirm)).toEqual(['bracedWall']);
  });
});

describe('traps', () => {
  it('furring: a direction read from ceiling marks on a furred ceiling is not seen', () => {
    const result = screen({
      joistDirection: { ...seen('parallel'), from: 'ceiling-marks' },
      furring: seen('yes'),
    });
    expect(result.outcome).toBe('cant-tell');
    expect(topics(result.lookAt)).toEqual(['joistDirection']);
    expect(result.lookAt[0].why).toMatch(/furring’s screw lines run across the joists/);
  });

  it('furring: marks on the ceiling count once furring was seen to be absent', () => {
    const result = screen({ joistDirection: { ...seen('parallel'), from: 'ceiling-marks' } });
    expect(result.outcome).toBe('likely-nonbearing');
  });

  it("furring: marks on the ceiling with furring only assumed absent → can't tell", () => {
    const result = screen({
      joistDirection: { ...seen('parallel'), from: 'ceiling-marks' },
      furring: assumed('no'),
    });
    expect(topics(result.lookAt)).toEqual(['joistDirection', 'furring']);
  });

  it('trusses: asked only where no ridge was found; clear-span trusses can screen nonbearing', () => {
    expect(applicableQuestions(NONBEARING)).not.toContain('trusses');
    const trussed = { ridge: seen('none' as const), trusses: seen('clear-span' as const) };
    expect(applicableQuestions(trussed)).toContain('trusses');
    const { ceilingJoistsTie: _tie, ...base } = NONBEARING;
    expect(screen(trussed, base).outcome).toBe('likely-nonbearing');
    expect(screen({ ridge: seen('none'), trusses: unsure }, base).outcome).toBe('cant-tell');
  });

  it('balloon framing: asked where a floor may be above, not under an attic', () => {
    expect(applicableQuestions(NONBEARING)).not.toContain('balloonFraming');
    expect(applicableQuestions({ above: seen('floor') })).toContain('balloonFraming');
    expect(applicableQuestions({})).toContain('balloonFraming');
  });

  it('a floor above: the roof questions do not apply, and the wall can screen nonbearing', () => {
    const { ridge: _r, ceilingJoistsTie: _c, purlinBraces: _p, ...rest } = NONBEARING;
    const floorAbove = { ...rest, above: seen('floor' as const), balloonFraming: seen('no' as const) };
    expect(applicableQuestions(floorAbove)).not.toContain('purlinBraces');
    expect(screenWall(floorAbove).outcome).toBe('likely-nonbearing');
  });
});

describe('the answers schema', () => {
  it('takes "not sure" without a basis, and refuses a known value without one', () => {
    expect(screenAnswersSchema.safeParse({ sag: { value: 'unsure' } }).success).toBe(true);
    expect(screenAnswersSchema.safeParse({ sag: { value: 'yes' } }).success).toBe(false);
    expect(screenAnswersSchema.safeParse({ below: { value: 'cellar', basis: 'seen' } }).success).toBe(false);
    expect(screenAnswersSchema.safeParse({ joistSpanAFt: -2 }).success).toBe(false);
  });
});
