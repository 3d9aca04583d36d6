/** How a schedule misses an asset's deadline. */
export interface DeadlineMiss {
  /** 1 if the first cleaning starts after the deadline week (or there is none), else 0. */
  missed: number;
  /** Weeks the first cleaning starts after the deadline, counting "no cleaning" as a start in week W; 0 if kept. */
  weeksLate: number;
}

/**
 * deadlineMiss: whether and by how many weeks a schedule misses an asset's deadline. The planner ranks plans that
 * must break deadlines first by the number of assets that miss (missed), then by the total weeks late.
 *
 * @param deadlineWeek latest start week of the first cleaning, or null (no deadline)
 * @param weeks W
 * @param firstStartWeek first start week of the schedule, or null for none
 */
export function deadlineMiss(deadlineWeek: number | null, weeks: number, firstStartWeek: number | null): DeadlineMiss {
  if (deadlineWeek === null) return { missed: 0, weeksLate: 0 };
  const start = firstStartWeek ?? weeks;
  return start <= deadlineWeek ? { missed: 0, weeksLate: 0 } : { missed: 1, weeksLate: start - deadlineWeek };
}
