/** The dates of the work, ISO (YYYY-MM-DD), in calendar days. */
export interface SchedulePlan {
  /** The day the timber and sheets arrive in the room. */
  materialsDeliveredOn: string;
  /** Days they sit in the room first, so they settle to its moisture (at least a week). */
  acclimatiseDays: number;
  buildStartsOn: string;
  /** Whole days of building: boards × days per board, rounded up. */
  buildDays: number;
  lastBuildDayOn: string;
  /** The day after the last build day: ready for track. */
  readyOn: string;
}

const DAY_MS = 86_400_000;

/** An ISO date `days` later (UTC, so no clock change moves it). */
export function addDays(isoDate: string, days: number): string {
  const [y, m, d] = isoDate.split('-').map(Number);
  return new Date(Date.UTC(y!, m! - 1, d!) + days * DAY_MS).toISOString().slice(0, 10);
}

/** Schedules delivery, acclimatising, then building board after board. */
export function planSchedule(
  settings: { startDate: string; buildDaysPerBoard: number; acclimatiseDays: number },
  boards: number,
): SchedulePlan {
  const buildDays = Math.max(1, Math.ceil(boards * settings.buildDaysPerBoard - 1e-9));
  const buildStartsOn = addDays(settings.startDate, settings.acclimatiseDays);
  return {
    materialsDeliveredOn: settings.startDate,
    acclimatiseDays: settings.acclimatiseDays,
    buildStartsOn,
    buildDays,
    lastBuildDayOn: addDays(buildStartsOn, buildDays - 1),
    readyOn: addDays(buildStartsOn, buildDays),
  };
}
