/**
 * The coordinator's operations that span several stores: create a study from a design, enrol a
 * reader into the balanced sequence order, and open a reader's period behind the washout gate.
 */
import type { StudyDesign } from '../core/design';
import { parseDesign } from '../core/design-schema';
import { buildSuggestions } from '../core/planting';
import { buildSchedule } from '../core/schedule';
import { sequenceIndexForSlot } from '../core/sequence-assignment';
import { validateDesign } from '../core/design-validate';
import { clockBackwardsProblem, periodEnd, periodGate, type WashoutOverride } from '../core/washout';
import { appendEvent, eventsOfStudy } from './events';
import { getCaseSet } from './case-sets';
import type { HeedDb } from './db';
import { InputError } from './input-error';
import { enrolReader, type NewReader } from './readers';
import type { StoredReader, StoredSession, StoredStudy } from './records';
import { getSession, sessionId, startSession } from './sessions';
import { createStudy, updateStudyDesign } from './studies';

const checkedDesign = async (db: HeedDb, caseSetId: string, design: StudyDesign) => {
  const parsed = parseDesign(design);
  if (!parsed.ok) throw new InputError(`The design is not valid: ${parsed.problems.join('; ')}`);
  const caseSet = await getCaseSet(db, caseSetId);
  const problems = validateDesign(parsed.design, caseSet.manifest);
  if (problems.length > 0) throw new InputError(`The design does not fit case set "${caseSet.name}": ${problems.join('; ')}`);
  return { design: parsed.design, suggestions: buildSuggestions(caseSet.manifest, parsed.design) };
};

export const createStudyFromDesign = async (db: HeedDb, name: string, caseSetId: string, design: StudyDesign): Promise<StoredStudy> => {
  const checked = await checkedDesign(db, caseSetId, design);
  return createStudy(db, { name, caseSetId, ...checked });
};

/** Edits a draft's design; readers already enrolled are reassigned to the new design's sequences by their slot. */
export const changeStudyDesign = async (db: HeedDb, study: StoredStudy, design: StudyDesign): Promise<StoredStudy> => {
  const checked = await checkedDesign(db, study.caseSetId, design);
  return updateStudyDesign(db, study.id, checked.design, checked.suggestions, (slot) => sequenceIndexForSlot(checked.design, slot));
};

export const enrolInStudy = (db: HeedDb, study: StoredStudy, input: NewReader): Promise<StoredReader> =>
  enrolReader(db, study.id, input, (slot) => sequenceIndexForSlot(study.design, slot));

const logClockBackwards = (db: HeedDb, studyId: string, detail: Record<string, unknown>) =>
  db.transaction('rw', db.events, () => appendEvent(db, studyId, 'clock-backwards', detail));

export type PeriodOpening =
  | { open: true; session: StoredSession }
  | { open: false; message: string };

/**
 * Opens (or reopens) a reader's period. Period p needs period p - 1 complete and, unless the
 * coordinator overrides it with a reason, the washout passed since then. The schedule is built
 * from the design's seed and the reader's code, so it is the same on any workstation.
 */
export const openPeriod = async (
  db: HeedDb, study: StoredStudy, reader: StoredReader, period: number, override: WashoutOverride | null, now: Date = new Date(),
): Promise<PeriodOpening> => {
  const current = await db.readers.get(reader.id);
  if (current?.withdrawn) return { open: false, message: `${current.code} was withdrawn (${current.withdrawn.reason}); no period opens for a withdrawn reader.` };
  const existing = await getSession(db, sessionId(reader.id, period));
  if (existing) return { open: true, session: existing };
  const sequence = study.design.sequences[reader.sequenceIndex];
  if (!sequence) throw new Error(`reader ${reader.code} has no sequence ${reader.sequenceIndex}`);
  if (period < 1 || period > sequence.periods.length) throw new InputError(`The study has no period ${period}.`);
  let previousDone: Date | null = null;
  if (period > 1) {
    const previous = await getSession(db, sessionId(reader.id, period - 1));
    if (!previous?.completedAt) return { open: false, message: `Period ${period - 1} of ${reader.code} is not complete yet.` };
    // measured from the latest time stored for that period: a clock set back while it was read cannot shorten the washout
    const own = (await eventsOfStudy(db, study.id)).filter((e) => e.detail.sessionId === previous.id).map((e) => new Date(e.at));
    const ended = periodEnd(new Date(previous.completedAt), [new Date(previous.startedAt), ...own]);
    if (ended.backwards) await logClockBackwards(db, study.id, { readerId: reader.id, period: period - 1, completedAt: previous.completedAt, latestStored: ended.end.toISOString() });
    previousDone = ended.end;
  }
  // the washout is measured on the wall clock: refuse (and log) a clock set back before stored times
  const latest = await db.events.orderBy('at').last();
  const backwards = clockBackwardsProblem(now, latest ? new Date(latest.at) : null);
  if (backwards) {
    await logClockBackwards(db, study.id, { readerId: reader.id, period, clock: now.toISOString(), latestStored: latest?.at ?? null });
    return { open: false, message: `Period ${period} of ${reader.code} was not opened. ${backwards}` };
  }
  const gate = periodGate(now, previousDone, study.design.washoutDays, override);
  if (!gate.open) return { open: false, message: `Period ${period} of ${reader.code} is not open yet. ${gate.message}` };
  const caseSet = await getCaseSet(db, study.caseSetId);
  const schedule = buildSchedule(study.design, caseSet.manifest, { id: reader.code, index: reader.slot, sequence });
  const planned = schedule.periods[period - 1];
  if (!planned) throw new Error(`no schedule for period ${period}`);
  const session = await startSession(db, {
    study, readerId: reader.id, period, items: planned.items, orderSeed: String(planned.orderSeed),
    override: previousDone && gate.override ? gate.override : null,
  });
  return { open: true, session };
};
