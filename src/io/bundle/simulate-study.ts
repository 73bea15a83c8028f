/**
 * A whole simulated study as a bundle snapshot: the demo (or any) case set, a crossover design,
 * simulated readers (core/simulated-readers.ts) answering through the session rules the app
 * uses (schedule, suggestions and planting, the session state machine), and the events the store
 * would write, chained. Each reader's clock is their own (period 1 starts `slot` x 10 minutes
 * after the study's start; period 2 the washout after period 1 ends), so a reader's answers and
 * events do not depend on who else is simulated or on which workstation: the K workstation copies
 * of `splitSnapshot` merge into exactly the unsplit study.
 * Throws RangeError for a design the case set cannot carry, with the design's problems.
 */
import type { CaseImage, CaseSetManifest } from '../../core/case-set';
import { genesisHash, type LinkContent } from '../../core/chain';
import { chainFromTexts, contentKeyOf } from './detail-text';
import { defaultDesign, type StudyDesign } from '../../core/design';
import { parseDesign } from '../../core/design-schema';
import { validateDesign } from '../../core/design-validate';
import { buildSuggestions } from '../../core/planting';
import { buildSchedule } from '../../core/schedule';
import { sequenceIndexForSlot } from '../../core/sequence-assignment';
import { applyCommit, currentPosition, planSteps, type CommittedAnswer, type SessionPosition } from '../../core/session';
import { DEFAULT_SIMULATION, simulateAnswers, type SimulatedAnswer, type SimulationParameters } from '../../core/simulated-readers';
import { indexSuggestions, suggestionKey } from '../../core/suggestions';
import type { SnapshotRead, SnapshotReader, SnapshotSession, StudySnapshot } from './snapshot';

export type SimulationOptions = {
  readers: number;
  seed: number;
  assistance: 'sequential' | 'concurrent';
  parameters?: SimulationParameters;
  /** the study's start, ISO; default 2026-12-01T08:00:00.000Z */
  start?: string;
};

export type SimulationCaseSet = { name: string; manifest: CaseSetManifest; imageSha256: Map<string, string>; images: CaseImage[] | null };

const MINUTE = 60_000;
const DAY = 24 * 60 * MINUTE;
const GAP_MS = 1000; // from one committed case to the next one shown

export const simulatedDesign = (manifest: CaseSetManifest, seed: number, assistance: 'sequential' | 'concurrent'): StudyDesign => {
  const design: StudyDesign = {
    ...defaultDesign(manifest.findings),
    sequences: [{ label: 'UA', periods: ['none', assistance] }, { label: 'AU', periods: [assistance, 'none'] }],
    planted: { falsePositive: { mode: 'rate', value: 0.1 }, falseNegative: { mode: 'rate', value: 0.1 }, stratifyBy: null },
    seed,
  };
  const parsed = parseDesign(design);
  const problems = parsed.ok ? validateDesign(parsed.design, manifest) : parsed.problems;
  if (problems.length > 0) throw new RangeError(`the simulated design does not fit the case set: ${problems.join('; ')}`);
  return design;
};

const iso = (ms: number): string => new Date(ms).toISOString();

export const simulateStudy = (caseSet: SimulationCaseSet, options: SimulationOptions): StudySnapshot => {
  const { manifest } = caseSet;
  if (!(Number.isInteger(options.readers) && options.readers >= 1 && options.readers <= 500)) throw new RangeError(`readers must be a whole number from 1 to 500, got ${options.readers}`);
  const design = simulatedDesign(manifest, options.seed, options.assistance);
  const suggestions = buildSuggestions(manifest, design);
  const shownTable = indexSuggestions(suggestions);
  const studyId = `sim-${options.seed}`;
  const start = Date.parse(options.start ?? '2026-12-01T08:00:00.000Z');
  const width = Math.max(2, String(options.readers).length);
  const readers: SnapshotReader[] = Array.from({ length: options.readers }, (_, slot) => {
    const code = `S${String(slot + 1).padStart(width, '0')}`;
    return { id: `sim-reader-${code}`, studyId, code, role: 'simulated reader', years: null, sequenceIndex: sequenceIndexForSlot(design, slot), slot, enrolledAt: iso(start + (slot + 1) * 1000) };
  });
  const answers = simulateAnswers(design, manifest, suggestions, readers, options.parameters ?? DEFAULT_SIMULATION, options.seed);
  const byReaderPeriod = new Map<string, SimulatedAnswer[]>();
  for (const a of answers) {
    const key = `${a.readerCode}/${a.period}`;
    const list = byReaderPeriod.get(key);
    if (list) list.push(a);
    else byReaderPeriod.set(key, [a]);
  }

  const contents: LinkContent[] = [
    { at: iso(start), type: 'study-created', detail: { caseSetId: 'simulated', name: `Simulated study (seed ${options.seed})`, seed: options.seed } },
    ...readers.map((r) => ({ at: r.enrolledAt, type: 'reader-enrolled', detail: { code: r.code, readerId: r.id, sequenceIndex: r.sequenceIndex, slot: r.slot } })),
  ];
  const sessions: SnapshotSession[] = [];
  let firstStart = Number.POSITIVE_INFINITY;
  for (const reader of readers) {
    const sequence = design.sequences[reader.sequenceIndex];
    if (!sequence) throw new RangeError(`no sequence ${reader.sequenceIndex}`);
    const schedule = buildSchedule(design, manifest, { id: reader.code, index: reader.slot, sequence });
    let clock = start + 60 * MINUTE + reader.slot * 10 * MINUTE;
    for (const planned of schedule.periods) {
      const sessionId = `${reader.id}/${planned.period}`;
      const startedAt = clock;
      firstStart = Math.min(firstStart, startedAt);
      contents.push({ at: iso(clock), type: 'session-started', detail: { orderSeed: String(planned.orderSeed), period: planned.period, readerId: reader.id, sessionId } });
      const plan = { items: planned.items, findings: design.findings };
      const committed = new Map<string, CommittedAnswer>();
      const own = new Map((byReaderPeriod.get(`${reader.code}/${planned.period}`) ?? []).map((a) => [suggestionKey(a.caseId, a.finding), a]));
      // The session machine's own steps, in order; applyCommit refuses any step that is not the
      // current one. (Each position is built from the step list rather than by currentPosition,
      // which rescans every answer: the end check below confirms the session is complete.)
      const steps = planSteps(plan);
      let shown = clock;
      steps.forEach((step, stepIndex) => {
        const item = planned.items[step.itemIndex];
        if (!item) throw new RangeError(`no item ${step.itemIndex}`);
        const position: SessionPosition = { done: false, step, stepIndex, totalSteps: steps.length, item, caseNumber: step.itemIndex + 1, caseCount: planned.items.length };
        const key = suggestionKey(item.caseId, step.finding);
        const answer = own.get(key);
        const part = step.phase === 'initial' ? answer?.initial : answer?.final;
        if (!answer || !part) throw new RangeError(`no simulated answer for ${reader.code} ${item.caseId} ${step.finding} ${step.phase}`);
        const first = stepIndex === 0 || steps[stepIndex - 1]?.itemIndex !== step.itemIndex;
        if (first) shown = clock;
        const next = applyCommit(position, step, committed.get(key) ?? null, part);
        committed.set(key, next);
        const aided = item.assistance !== 'none';
        const row = aided ? shownTable.get(key) : undefined;
        // Keys in canonical (sorted) order, at every depth: canonicalJson then takes its fast path
        // (core/chain.ts), several times quicker over tens of thousands of events; same text either way.
        const read: SnapshotRead = {
          aiCall: row ? row.call : null, aiPlanted: row ? row.planted : false, aiScore: row && design.showScore ? row.score : null,
          caseId: item.caseId, cautionShown: aided && item.caution, final: next.final, finding: step.finding,
          id: `${sessionId}/${item.caseId}/${step.finding}`, initial: next.initial, period: planned.period, readerId: reader.id, sessionId, shownAt: iso(shown), studyId,
        };
        clock = Math.max(clock, shown + part.ms);
        contents.push({ at: iso(clock), type: step.phase === 'initial' ? 'initial-committed' : 'final-committed', detail: {
          call: part.call, caseId: item.caseId, confidence: part.confidence, finding: step.finding, ms: part.ms, read, sessionId,
        } });
        const lastOfCase = steps[stepIndex + 1]?.itemIndex !== step.itemIndex;
        if (lastOfCase) clock += GAP_MS;
      });
      if (!currentPosition(plan, [...committed.values()]).done) throw new RangeError(`session ${sessionId} did not complete`);
      const completedAt = clock;
      contents.push({ at: iso(completedAt), type: 'session-completed', detail: { sessionId } });
      sessions.push({ id: sessionId, studyId, readerId: reader.id, period: planned.period, items: planned.items, orderSeed: String(planned.orderSeed), startedAt: iso(startedAt), completedAt: iso(completedAt), override: null });
      clock = completedAt + design.washoutDays * DAY + 60 * MINUTE;
    }
  }
  const lockedAt = iso(firstStart - 1);
  contents.push({ at: lockedAt, type: 'design-locked', detail: { by: 'first session start', sessionId: `${readers[0]?.id ?? ''}/1` } });
  return {
    study: { id: studyId, name: `Simulated study (seed ${options.seed})`, design, createdAt: iso(start), lockedAt },
    suggestions,
    caseSet: { name: caseSet.name, manifest, imageSha256: caseSet.imageSha256 },
    images: caseSet.images,
    readers,
    sessions: sessions.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)),
    events: chainFromTexts(genesisHash(studyId), orderByTime(contents)),
  };
};

/** Time order, ties by content: the order a merge of workstation copies gives (io/bundle/merge.ts). */
const orderByTime = (contents: LinkContent[]): LinkContent[] =>
  contents.map((c) => ({ c, key: contentKeyOf(c) })).sort((a, b) => (a.c.at < b.c.at ? -1 : a.c.at > b.c.at ? 1 : a.key < b.key ? -1 : a.key > b.key ? 1 : 0)).map((x) => x.c);

/**
 * The copies of K workstations: every copy holds the study and all enrolments (made by the
 * coordinator before handing out the study); reader i reads on workstation i mod K.
 */
export const splitSnapshot = (snapshot: StudySnapshot, k: number): StudySnapshot[] => {
  if (!(Number.isInteger(k) && k >= 1)) throw new RangeError(`--split needs a whole number >= 1, got ${k}`);
  const station = new Map(snapshot.readers.map((r) => [r.id, r.slot % k]));
  const sessionStation = new Map(snapshot.sessions.map((s) => [s.id, station.get(s.readerId) ?? 0]));
  return Array.from({ length: k }, (_, w) => {
    const mine = (sessionId: unknown): boolean => typeof sessionId !== 'string' || sessionStation.get(sessionId) === w;
    const contents = snapshot.events.filter((e) => e.type === 'design-locked' || mine(e.detail.sessionId));
    return {
      ...snapshot,
      sessions: snapshot.sessions.filter((s) => sessionStation.get(s.id) === w),
      events: chainFromTexts(genesisHash(snapshot.study.id), contents),
    };
  });
};
