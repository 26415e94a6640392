/** A trade whose hours the price book rates (rate/<trade>). */
export type Trade = 'carpenter' | 'labourer' | 'drywall' | 'painter';

/** One trip of one trade to the house: the hours worked on it. */
export interface Trip {
  trade: Trade;
  label: string;
  hours: number;
}

/**
 * Hours charged for a trip: the hours worked, but never less than the firm's least hours per trip (a trade
 * that comes for one hour is paid for the trip).
 * @param hours hours worked on the trip
 * @param dayMinimumHours least hours charged per trip
 * @returns hours charged
 * @example chargedHours(1.5, 4) // 4
 * Reference: common practice (minimum charge per trip).
 */
export function chargedHours(hours: number, dayMinimumHours: number): number {
  if (hours <= 0) return 0;
  return Math.max(hours, dayMinimumHours);
}

/**
 * Trips of the drywall finisher: one to hang, then one per coat of joint compound, each on its own day
 * because each coat dries before the next (three coats: tape, fill, finish).
 * @param areaSf drywall area, sq ft
 * @param hangHoursPerSf hours to hang a sq ft
 * @param coatHoursPerSf hours for one coat on a sq ft
 * @param coats coats of compound
 * @returns the trips, hang first
 * @example drywallTrips(100, 0.02, 0.01, 3).length // 4
 * Reference: common practice (drywall finishing in three coats with drying between, a return trip each).
 */
export function drywallTrips(
  areaSf: number,
  hangHoursPerSf: number,
  coatHoursPerSf: number,
  coats: number,
): Trip[] {
  if (areaSf <= 0) return [];
  const trips: Trip[] = [{ trade: 'drywall', label: 'Hang drywall', hours: areaSf * hangHoursPerSf }];
  for (let coat = 1; coat <= Math.round(coats); coat++)
    trips.push({ trade: 'drywall', label: `Coat ${coat} of joint compound`, hours: areaSf * coatHoursPerSf });
  return trips;
}

export interface CrewSchedule {
  /** Days the framing crew works (carpenters and labourers together). */
  framingDays: number;
  /** Return trips after the framing: drywall hang and coats, paint. */
  returnTrips: number;
  /** Calendar days waiting: for the engineer, inspections, concrete cure. */
  waiting: { label: string; days: number }[];
  /** Days the house stands on temporary walls: from shoring up until the member carries the load. */
  shoredDays: number;
  /** First shoring to last paint trip, in working and waiting days, not counting the engineer's wait. */
  totalDays: number;
}

export interface ScheduleInput {
  /** Framing hours before the member carries load (shoring, demolition, set, posts, footings). */
  framingHoursBeforeLoad: number;
  /** Framing hours after (hangers once the member bears, jacks and kings, striking the shoring, trim). */
  framingHoursAfterLoad: number;
  crewDayHours: number;
  /** Finish trips after framing (each its own day). */
  finishTrips: number;
  engineerWaitDays: number;
  /** Inspections the work waits for (footing before the pour; framing before the walls close). */
  inspections: { label: string; days: number }[];
  /** Days the concrete cures before the post is loaded (0 without a new footing). */
  cureDays: number;
}

/**
 * Labour as crew days: the framing crew's hours in whole days (a part day is a day), the finish trips
 * each a day, and the waits. The house stays shored from the day the temporary walls go up until the
 * member bears: the framing days before load, the footing inspection and the concrete cure.
 * @param input hours (h), crew day (h), trips, waits (days)
 * @returns framing days, return trips, waits, shored days, total days
 * @example crewSchedule({ framingHoursBeforeLoad: 12, framingHoursAfterLoad: 4, crewDayHours: 8, finishTrips: 4, engineerWaitDays: 10, inspections: [], cureDays: 0 }).framingDays // 2
 * Reference: common practice (crew days, return trips for finishes, waits for the engineer, the inspector
 *   and concrete cure).
 */
export function crewSchedule(input: ScheduleInput): CrewSchedule {
  if (!(input.crewDayHours > 0)) throw new RangeError('A crew day must be above 0 hours');
  const before = Math.ceil(input.framingHoursBeforeLoad / input.crewDayHours - 1e-9);
  const framingDays = Math.ceil(
    (input.framingHoursBeforeLoad + input.framingHoursAfterLoad) / input.crewDayHours - 1e-9,
  );
  const footingInspection = input.inspections.find((i) => /footing/i.test(i.label));
  const waiting = [
    ...(input.engineerWaitDays > 0
      ? [{ label: "Waiting for the engineer's design", days: input.engineerWaitDays }]
      : []),
    ...input.inspections.filter((i) => i.days > 0),
    ...(input.cureDays > 0 ? [{ label: 'Concrete cure before loading the post', days: input.cureDays }] : []),
  ];
  const shoredDays = Math.max(1, before) + (footingInspection?.days ?? 0) + input.cureDays;
  const inspectionDays = input.inspections.reduce((sum, i) => sum + i.days, 0);
  return {
    framingDays,
    returnTrips: input.finishTrips,
    waiting,
    shoredDays,
    totalDays: framingDays + input.finishTrips + inspectionDays + input.cureDays,
  };
}
