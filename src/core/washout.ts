/**
 * Whether a reader may start their next period: the washout is `washoutDays` whole 24-hour days
 * from the moment the previous period was completed (not calendar days, so time zones and
 * daylight-saving changes do not matter). The first period has no previous one and is always open.
 *
 * A coordinator may open a period early with an override; it needs a non-empty reason and who
 * gave it (both are logged by the caller). An override without them is refused, with a message.
 * Throws RangeError when washoutDays is not a whole number >= 0 or a date is invalid.
 * Example: completed 2026-01-01T09:00Z, 28 days -> opens at 2026-01-29T09:00Z.
 */
export type WashoutOverride = { reason: string; by: string; at: string };

export type PeriodGate =
  | { open: true; override?: WashoutOverride }
  | { open: false; opensAt: Date; message: string };

const DAY_MS = 24 * 60 * 60 * 1000;

/** When the period after one completed at `previousCompletedAt` opens. */
export const periodOpensAt = (previousCompletedAt: Date, washoutDays: number): Date => new Date(previousCompletedAt.getTime() + washoutDays * DAY_MS);

export const when = (d: Date): string => `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

export const periodGate = (
  now: Date,
  previousPeriodCompletedAt: Date | null,
  washoutDays: number,
  override: WashoutOverride | null,
): PeriodGate => {
  if (!Number.isInteger(washoutDays) || washoutDays < 0) throw new RangeError(`washout days must be a whole number >= 0, got ${washoutDays}`);
  if (Number.isNaN(now.getTime())) throw new RangeError('the current time is not a valid date');
  if (previousPeriodCompletedAt === null) return { open: true };
  if (Number.isNaN(previousPeriodCompletedAt.getTime())) throw new RangeError('the completion time of the previous period is not a valid date');
  const opensAt = periodOpensAt(previousPeriodCompletedAt, washoutDays);
  if (now.getTime() >= opensAt.getTime()) return { open: true };
  const daysLeft = Math.ceil((opensAt.getTime() - now.getTime()) / DAY_MS);
  const wait = `It opens at ${when(opensAt)}, after the ${washoutDays}-day washout (${daysLeft} day${daysLeft === 1 ? '' : 's'} left).`;
  if (override === null) return { open: false, opensAt, message: wait };
  if (override.reason.trim() === '') {
    return { open: false, opensAt, message: `${wait} Opening it early needs a reason; none was given.` };
  }
  if (override.by.trim() === '') {
    return { open: false, opensAt, message: `${wait} Opening it early needs the name of who allows it; none was given.` };
  }
  return { open: true, override };
};

/**
 * Slack for small clock corrections (time synchronisation steps of a few seconds). A rule of
 * thumb with no published source.
 */
export const CLOCK_SLACK_MS = 60_000;

/**
 * Why the wall clock cannot be trusted for the washout, or null: it reads earlier than the latest
 * time already stored (the clock was set back), so a washout measured with it could be skipped.
 * Example: latest stored 2026-03-01T10:00Z, now 2026-02-01T10:00Z -> a message naming both.
 */
export const clockBackwardsProblem = (now: Date, latestStored: Date | null): string | null => {
  if (latestStored === null || Number.isNaN(latestStored.getTime())) return null;
  if (now.getTime() >= latestStored.getTime() - CLOCK_SLACK_MS) return null;
  return `The computer's clock reads ${when(now)}, earlier than the latest time Heed has stored (${when(latestStored)}). `
    + 'The clock seems to have been set back, so the washout cannot be checked. Set the clock right, then try again (this refusal is logged).';
};

/**
 * When a finished period really ended, from every time stored for it (its start, its answers,
 * its completion): the latest of them. A completion stamped earlier than the session's own
 * earlier records means the clock was set back during the period; the washout is then measured
 * from the latest stored time, and `backwards` says so (so the caller can log it).
 */
export const periodEnd = (completedAt: Date, storedTimes: readonly Date[]): { end: Date; backwards: boolean } => {
  let end = completedAt;
  for (const t of storedTimes) if (!Number.isNaN(t.getTime()) && t.getTime() > end.getTime()) end = t;
  return { end, backwards: end.getTime() - completedAt.getTime() > CLOCK_SLACK_MS };
};
