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
