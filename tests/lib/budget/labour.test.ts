import { describe, expect, it } from 'vitest';
import { chargedHours, crewSchedule, drywallTrips } from '@/lib/budget';
import { expectApprox } from '@/tests/helpers/approx';

describe('labour by trip and crew days (common practice)', () => {
  it('charges a trip at least the day minimum', () => {
    expect(chargedHours(1.5, 4)).toBe(4);
    expect(chargedHours(6, 4)).toBe(6);
    expect(chargedHours(0, 4)).toBe(0);
  });

  it('sends the drywall finisher back once per coat (three coats: tape, fill, finish)', () => {
    const trips = drywallTrips(100, 0.04, 0.02, 3);
    expect(trips.map((t) => t.label)).toEqual([
      'Hang drywall',
      'Coat 1 of joint compound',
      'Coat 2 of joint compound',
      'Coat 3 of joint compound',
    ]);
    expectApprox(trips[0].hours, 4, { abs: 1e-12 });
    expectApprox(trips[1].hours, 2, { abs: 1e-12 });
    expect(drywallTrips(0, 0.04, 0.02, 3)).toEqual([]);
  });

  it('counts framing days, waits and the days the house stays shored', () => {
    const schedule = crewSchedule({
      framingHoursBeforeLoad: 12,
      framingHoursAfterLoad: 5,
      crewDayHours: 8,
      finishTrips: 5,
      engineerWaitDays: 10,
      inspections: [
        { label: 'Footing inspection before the pour', days: 2 },
        { label: 'Framing inspection before the walls close', days: 2 },
      ],
      cureDays: 3,
    });
    // 17 h of framing is 3 crew days; 12 h before the member bears is 2 days, plus the footing inspection
    // (2) and the cure (3) with the walls still up: 7 days shored.
    expect(schedule.framingDays).toBe(3);
    expect(schedule.shoredDays).toBe(7);
    expect(schedule.returnTrips).toBe(5);
    expect(schedule.waiting.map((w) => w.days)).toEqual([10, 2, 2, 3]);
    expect(schedule.totalDays).toBe(3 + 5 + 4 + 3);
  });

  it('keeps the house shored at least a day', () => {
    const schedule = crewSchedule({
      framingHoursBeforeLoad: 0,
      framingHoursAfterLoad: 0,
      crewDayHours: 8,
      finishTrips: 0,
      engineerWaitDays: 0,
      inspections: [],
      cureDays: 0,
    });
    expect([schedule.shoredDays, schedule.waiting]).toEqual([1, []]);
  });
});
