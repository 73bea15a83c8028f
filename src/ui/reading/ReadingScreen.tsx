/**
 * The reading view: one case at a time, dark and calm, keyboard first. Each answer is committed
 * to the database before the next question appears; the clock (performance.now, pausable) starts
 * when the case's pixels are drawn.
 */
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { flushSync } from 'react-dom';
import { elapsedMs, pauseClock, resumeClock, startClock, type ActiveClock } from '../../core/active-clock';
import { callFromRating, defaultAnswerScale } from '../../core/answer-scale';
import type { Bit } from '../../core/read-log';
import { RESEARCH_CAUTION } from '../../core/research-caution';
import { answerProblem, suggestionVisible } from '../../core/session';
import { suggestionKey } from '../../core/suggestions';
import { logSessionMoment } from '../../store/sessions';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions, type Notice } from '../state/app-state';
import { AnswerPanel } from './AnswerPanel';
import { createImageCache } from './image-cache';
import { DEFAULT_VIEW, ImageViewport, type View } from './ImageViewport';
import type { GrayImage } from './gray-image';
import { progressLabel } from './progress-label';
import { RatingPanel } from './RatingPanel';
import { ReadingDone, ReadingOverlay, type Interlude } from './ReadingOverlay';
import { SuggestionPanel } from './SuggestionPanel';
import { readingKeyAction } from './reading-keys';
import { shouldShowTruth, truthLines, type TruthLine } from './truth-feedback';
import { TruthPanel } from './TruthPanel';
import { UndecodableCase } from './UndecodableCase';
import { useFullscreenPause } from './use-fullscreen-pause';
import { useReadingSession } from './use-reading-session';

type Props = { studyId: string; sessionId: string; notice: Notice | null };

/** A save that takes longer than this shows the answer buttons as busy; a quicker one renders nothing until it is done. */
const SHOW_BUSY_AFTER_MS = 150;

/** Logs a session moment; a failed log line must not interrupt reading, so it is reported, not thrown. */
const logMoment = (...args: Parameters<typeof logSessionMoment>): void => {
  logSessionMoment(...args).catch((e: unknown) => actions.notify({ kind: 'error', text: `Could not log ${args[2]}: ${String(e)}` }));
};

export const ReadingScreen = ({ studyId, sessionId, notice }: Props) => {
  const db = useDb();
  const { loaded, position, reads, error, commit, skip } = useReadingSession(db, studyId, sessionId);
  // an image of the current case that the browser could not decode: the reader is offered a way on
  const [failed, setFailed] = useState<{ path: string; message: string } | null>(null);
  const setId = loaded?.setId;
  const cache = useMemo(() => (setId ? createImageCache(db, setId) : null), [db, setId]);
  const [loadedImage, setLoadedImage] = useState<{ path: string; image: GrayImage } | null>(null);
  // view and image choice belong to one case: a new case starts from the defaults in its first render
  const [viewOf, setViewOf] = useState<{ caseId: string; view: View; imageIndex: number } | null>(null);
  const [call, setCall] = useState<Bit | null>(null);
  const [confidence, setConfidence] = useState<number | null>(null);
  const [rating, setRating] = useState<number | null>(null);
  // busy while an answer or a skip is being stored: the ref guards at once, the state (buttons
  // shown disabled) only when a save takes long enough to be seen, so a quick commit renders once
  const [busy, setBusy] = useState(false);
  const busyNow = useRef(false);
  const [paused, setPaused] = useState(false);
  const pausedNow = useRef(false);
  // interludes already continued from, keyed `${kind}/${caseId}`
  const [interludesTaken, setInterludesTaken] = useState<ReadonlySet<string>>(new Set());
  // the truth after a finished case (training study, or a practice case): shown until the reader continues
  const [feedback, setFeedback] = useState<{ caseId: string; practice: boolean; lines: TruthLine[] } | null>(null);
  const [clockStarted, setClockStarted] = useState(false);
  const clock = useRef<ActiveClock | null>(null);
  const clockCase = useRef<string | null>(null);
  const shownAt = useRef('');

  const item = position && !position.done ? position.item : null;
  const mine = viewOf && item && viewOf.caseId === item.caseId ? viewOf : null;
  const view = mine?.view ?? DEFAULT_VIEW;
  const imageIndex = mine?.imageIndex ?? 0;
  const setView = useCallback((next: View | ((v: View) => View)) => {
    if (!item) return;
    setViewOf((old) => {
      const base = old && old.caseId === item.caseId ? old : { caseId: item.caseId, view: DEFAULT_VIEW, imageIndex: 0 };
      return { ...base, view: typeof next === 'function' ? next(base.view) : next };
    });
  }, [item]);
  const setImageIndex = useCallback((step: (i: number) => number) => {
    if (!item) return;
    setViewOf((old) => {
      const base = old && old.caseId === item.caseId ? old : { caseId: item.caseId, view: DEFAULT_VIEW, imageIndex: 0 };
      return { ...base, imageIndex: step(base.imageIndex) };
    });
  }, [item]);
  const caseRecord = item ? loaded?.cases.get(item.caseId) : undefined;
  const progress = loaded && position && !position.done ? progressLabel(loaded.session.items, position.step.itemIndex) : null;
  // A cover before this case until the reader continues (the practice-over announcement, then a
  // rest break): derived, so it holds from the case's first render.
  const interlude: Interlude | null = !item || feedback ? null
    : progress?.firstMainAfterPractice && !interludesTaken.has(`practice-over/${item.caseId}`) ? 'practice-over'
      : item.breakBefore && !interludesTaken.has(`break/${item.caseId}`) ? 'break' : null;
  const breakFor = interlude === null ? null : item?.caseId ?? null;
  const currentRead = item && position && !position.done
    ? reads.find((r) => r.caseId === item.caseId && r.finding === position.step.finding) : undefined;

  // Each new case loads the next case's images ahead, so they can be drawn in its first render.
  const itemIndex = position && !position.done ? position.step.itemIndex : -1;
  // Started after this case's frame is painted, so decoding the next image never delays it.
  useEffect(() => {
    if (!caseRecord || !cache || !loaded || itemIndex < 0) return;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const frame = requestAnimationFrame(() => {
      timer = setTimeout(() => {
        const next = loaded.session.items[itemIndex + 1];
        const nextPaths = next ? loaded.cases.get(next.caseId)?.images ?? [] : [];
        cache.forget(new Set([...caseRecord.images, ...nextPaths]));
        for (const path of nextPaths) cache.get(path).catch(() => undefined); // a failure shows when that case is reached
      }, 0);
    });
    return () => { cancelAnimationFrame(frame); clearTimeout(timer); };
  }, [caseRecord, cache, loaded, itemIndex]);

  const imagePath = caseRecord?.images[imageIndex] ?? caseRecord?.images[0];
  useEffect(() => {
    // a prefetched image is drawn from the cache in the case's first render: nothing to wait for
    if (!cache || !imagePath || cache.peek(imagePath)) return;
    let live = true;
    cache.get(imagePath).then((decoded) => { if (live) setLoadedImage({ path: imagePath, image: decoded }); }, (e: unknown) => { if (live) setFailed({ path: imagePath, message: e instanceof Error ? e.message : String(e) }); });
    return () => { live = false; };
  }, [cache, imagePath]);

  // Only this case's own pixels are handed to the viewport, never the previous case's.
  const prefetched = imagePath ? cache?.peek(imagePath) : undefined;
  const image = prefetched ?? (loadedImage && caseRecord?.images.includes(loadedImage.path) ? loadedImage.image : null);
  const undecodable = failed && !image && failed.path === imagePath ? failed : null;

  // The clock of a case starts in the animation frame that first shows its pixels (drawn to the
  // canvas just before), the moment the case-painted signal marks; not during a break.
  const onDrawn = useCallback(() => {
    if (!item || breakFor || feedback || clockCase.current === item.caseId) return;
    clockCase.current = item.caseId;
    const resumedInitial = currentRead?.initial?.ms ?? 0;
    shownAt.current = currentRead?.shownAt ?? new Date().toISOString();
    requestAnimationFrame(() => {
      if (clockCase.current !== item.caseId) return;
      const now = performance.now();
      const started = { ...startClock(now), accumulated: resumedInitial };
      // shown while paused (a save was finishing when the reader paused): the clock waits for resume
      clock.current = pausedNow.current ? pauseClock(started, now) : started;
      setClockStarted(true);
      signal('case-painted', { caseId: item.caseId });
    });
  }, [item, breakFor, feedback, currentRead]);

  useEffect(() => {
    if (position?.done && !feedback) signal('ready', { screen: 'reading-done' });
  }, [position, feedback]);

  const design = loaded?.study.design;
  const scale = design?.answerScale ?? defaultAnswerScale();
  const ratingScale = scale.kind !== 'call-confidence';
  const askConfidence = !ratingScale && (design?.askConfidence ?? true);
  const problem = answerProblem({ call, confidence, rating }, askConfidence, scale.kind);

  // `keyAt`: the committing key's event.timeStamp (same clock as performance.now), so the time ends
  // at the key press itself, not when the main thread got round to handling it
  const doCommit = useCallback(async (keyAt?: number) => {
    if (busyNow.current || paused || breakFor || feedback || problem !== null || !clock.current || !item || !loaded) return;
    const committedCall = ratingScale && rating !== null ? callFromRating(scale, rating) : call;
    if (committedCall === null) return;
    const end = Math.min(keyAt ?? performance.now(), performance.now());
    const ms = elapsedMs(clock.current, Math.max(end, clock.current.runningSince ?? end));
    busyNow.current = true;
    const showBusy = setTimeout(() => setBusy(true), SHOW_BUSY_AFTER_MS);
    try {
      const result = await commit({
        call: committedCall, confidence: askConfidence ? confidence : null, rating: ratingScale ? rating : null, ms, shownAt: shownAt.current,
      });
      signal('saved');
      const next = result?.next;
      const caseFinished = !next || next.done || next.item.caseId !== item.caseId;
      if (!next || next.done || next.item.caseId !== clockCase.current) {
        // a new case: no answer is taken until its own image is drawn and its clock starts
        clock.current = null;
      }
      // the answer is committed before the truth shows: after a crash, reading resumes at the next question
      const truth = result && caseFinished && caseRecord && shouldShowTruth(loaded.study.design.training, item.practice)
        ? { caseId: item.caseId, practice: item.practice, lines: truthLines(caseRecord, result.reads, loaded.study.design.findings) } : null;
      // One synchronous render for everything the answer changes: the next case is rendered, and
      // its prefetched image drawn, in this task, so it is painted in the next frame.
      flushSync(() => {
        result?.show();
        if (clock.current === null) setClockStarted(false);
        if (truth) setFeedback(truth);
        setCall(null);
        setConfidence(null);
        setRating(null);
        setBusy(false);
      });
      // logged after the render: the log line is not what the reader waits for
      if (truth) logMoment(db, loaded.session, 'truth-shown', { caseId: truth.caseId, practice: truth.practice, training: loaded.study.design.training });
    } catch (e) {
      actions.notify({ kind: 'error', text: `Not saved: ${e instanceof Error ? e.message : String(e)}` });
      setBusy(false);
    } finally {
      clearTimeout(showBusy);
      busyNow.current = false;
    }
  }, [paused, breakFor, feedback, problem, call, confidence, rating, ratingScale, scale, askConfidence, commit, item, loaded, caseRecord, db]);

  // A case that cannot be shown is skipped in the store (logged with its reason); its clock never ran.
  const skipUndecodable = useCallback(async () => {
    if (busyNow.current || !undecodable) return;
    busyNow.current = true;
    setBusy(true);
    try {
      await skip(`${undecodable.path}: ${undecodable.message}`);
      clock.current = null;
      clockCase.current = null;
      setClockStarted(false);
      setFailed(null);
      setCall(null);
      setConfidence(null);
      setRating(null);
      signal('saved');
    } catch (e) {
      actions.notify({ kind: 'error', text: `Could not skip the case: ${e instanceof Error ? e.message : String(e)}` });
    } finally {
      busyNow.current = false;
      setBusy(false);
    }
  }, [undecodable, skip]);

  // Pausing works at any moment of a case: before its image is drawn (the clock then starts
  // paused) and while a save finishes (that answer's time was already taken).
  const setPause = useCallback((next: boolean, why: string) => {
    if (pausedNow.current === next) return;
    const now = performance.now();
    if (clock.current) clock.current = next ? pauseClock(clock.current, now) : resumeClock(clock.current, now);
    pausedNow.current = next;
    setPaused(next);
    if (loaded) logMoment(db, loaded.session, next ? 'paused' : 'resumed', { caseId: clockCase.current, by: why });
  }, [db, loaded]);
  const togglePause = useCallback(() => setPause(!pausedNow.current, 'reader'), [setPause]);
  const toggleFullscreen = useFullscreenPause(useCallback(() => setPause(true, 'left full screen'), [setPause]));

  const endBreak = useCallback(() => {
    if (!breakFor || !interlude) return;
    setInterludesTaken((taken) => new Set([...taken, `${interlude}/${breakFor}`]));
    if (loaded) logMoment(db, loaded.session, interlude === 'break' ? 'break-taken' : 'practice-over-shown', { beforeCase: breakFor });
  }, [breakFor, interlude, db, loaded]);

  const endFeedback = useCallback(() => setFeedback(null), []);

  // The window's key listener is added once; it calls the handler of the latest render, put in
  // place by a layout effect, so this render's answer is used before the next key can arrive.
  const keyHandler = useRef<(event: KeyboardEvent) => void>(() => undefined);
  useLayoutEffect(() => {
    const onKey = (event: KeyboardEvent) => keyHandler.current(event);
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
  useLayoutEffect(() => {
    keyHandler.current = (event: KeyboardEvent) => {
      const action = readingKeyAction(event, scale.kind);
      if (!action) return;
      event.preventDefault();
      if (action.kind === 'fullscreen') { toggleFullscreen(); return; }
      if (action.kind === 'pause') {
        if (breakFor && !pausedNow.current) endBreak(); else togglePause();
        return;
      }
      // the truth on screen: Enter continues (once not paused); other keys wait
      if (feedback) { if (action.kind === 'commit' && !pausedNow.current) endFeedback(); return; }
      if (paused || busyNow.current) return;
      if (breakFor) { if (action.kind === 'commit') endBreak(); return; }
      switch (action.kind) {
        case 'call': setCall(action.call); break;
        case 'confidence': setConfidence(action.value); break;
        case 'confidence-step': setConfidence((c) => Math.min(100, Math.max(0, (c ?? 50) + action.step))); break;
        case 'rating': setRating(action.value); break;
        case 'rating-step': setRating((r) => Math.min(100, Math.max(0, (r ?? 50) + action.step))); break;
        case 'commit': void doCommit(event.timeStamp); break;
        case 'zoom': setView((v) => ({ ...v, zoom: Math.min(8, Math.max(0.5, v.zoom * action.factor)) })); break;
        case 'reset-view': setView(DEFAULT_VIEW); break;
        case 'image': setImageIndex((i) => Math.min(Math.max(0, i + action.step), (caseRecord?.images.length ?? 1) - 1)); break;
      }
    };
  }, [paused, breakFor, feedback, scale.kind, doCommit, togglePause, toggleFullscreen, endBreak, endFeedback, caseRecord, setView, setImageIndex]);

  if (error) return <main className="reading"><p role="alert">Cannot open this session: {error}</p></main>;
  if (!loaded || !position) return <main className="reading" aria-busy="true"><p>Opening the session…</p></main>;
  if (position.done && feedback) return <main className="reading"><TruthPanel lines={feedback.lines} practice={feedback.practice} onContinue={endFeedback} /></main>;
  if (position.done) return <ReadingDone readerCode={loaded.readerCode} period={loaded.session.period} onBack={() => actions.handOver(studyId, loaded.session.readerId)} />;

  const { step } = position;
  const current = position.item;
  const shown = loaded.suggestions.get(suggestionKey(current.caseId, step.finding));
  const visible = suggestionVisible(current.assistance, step.phase) && shown !== undefined;
  const sequential = current.assistance === 'sequential';
  const answerWord = ratingScale ? 'rating' : 'call';
  const phaseLabel = sequential ? (step.phase === 'initial' ? `first ${answerWord}` : `final ${answerWord}`) : answerWord;
  const findingCount = loaded.study.design.findings.length;

  return (
    <main className="reading" data-case={current.caseId} data-phase={step.phase} data-assistance={current.assistance}>
      <header className="reading-bar">
        <span className="reading-progress" role="status" aria-label="Progress">{progress?.text}</span>
        {current.practice && <span className="badge badge-practice">Practice case</span>}
        {loaded.study.design.training && <span className="badge badge-practice">Training: the truth follows each case</span>}
        {findingCount > 1 && <span>Question {loaded.study.design.findings.indexOf(step.finding) + 1} of {findingCount}</span>}
        <span className="reading-reader">Reader {loaded.readerCode} · period {loaded.session.period}</span>
        <span className="reading-caution" title={RESEARCH_CAUTION}>Research and training tool, not a medical device</span>
        <button type="button" onClick={toggleFullscreen}>Full screen <kbd>F</kbd></button>
        <button type="button" onClick={togglePause} disabled={!clockStarted && !paused && !undecodable}>{paused ? 'Resume' : 'Pause'} <kbd>Esc</kbd></button>
      </header>
      <div className="reading-body">
        <div className="reading-image">
          <ImageViewport image={image} view={view} onView={setView} hidden={paused || breakFor !== null || feedback !== null || image === null} onDrawn={onDrawn} />
          <div className="view-controls" role="group" aria-label="Image controls">
            {caseRecord && caseRecord.images.length > 1 && (
              <span>Image {imageIndex + 1} of {caseRecord.images.length} <kbd>[</kbd> <kbd>]</kbd></span>
            )}
            <label>Level <input type="range" min={0} max={255} value={view.level} onChange={(e) => setView({ ...view, level: Number(e.target.value) })} /></label>
            <label>Width <input type="range" min={8} max={512} value={view.width} onChange={(e) => setView({ ...view, width: Number(e.target.value) })} /></label>
            <button type="button" onClick={() => setView(DEFAULT_VIEW)}>Reset view <kbd>R</kbd></button>
            <small>zoom: wheel or + −; pan: drag</small>
          </div>
        </div>
        <aside className="reading-side">
          {sequential && step.phase === 'final' && currentRead?.initial && (
            <p className="locked-initial">
              {currentRead.initial.rating != null
                ? `Your first rating (locked): ${scale.kind === 'percent' ? `${currentRead.initial.rating}%` : `${currentRead.initial.rating} ${scale.labels[currentRead.initial.rating - 1] ?? ''}`}`
                : `Your first call (locked): ${currentRead.initial.call === 1 ? 'present' : 'absent'}${currentRead.initial.confidence !== null ? `, confidence ${currentRead.initial.confidence}` : ''}`}
            </p>
          )}
          {visible && shown && (
            <SuggestionPanel call={shown.call} score={loaded.study.design.showScore ? shown.score : null} caution={current.caution ? loaded.study.design.caution.text : null} />
          )}
          {ratingScale ? (
            <RatingPanel
              question={`Finding “${step.finding}”: how likely is it present?`} scale={scale} rating={rating} problem={problem} busy={busy}
              phaseLabel={phaseLabel} onRating={setRating} onCommit={() => void doCommit()}
            />
          ) : (
            <AnswerPanel
              question={`Finding “${step.finding}”: present or absent?`}
              call={call} confidence={confidence} askConfidence={askConfidence} problem={problem} busy={busy}
              phaseLabel={phaseLabel} onCall={setCall} onConfidence={setConfidence} onCommit={() => void doCommit()}
            />
          )}
        </aside>
      </div>
      {undecodable && !paused && !interlude && !feedback && (
        <UndecodableCase busy={busy} onSkip={() => void skipUndecodable()} onHandBack={() => { setPause(true, 'image cannot be shown'); actions.handOver(studyId); }} />
      )}
      <ReadingOverlay paused={paused} interlude={interlude} onContinue={paused ? togglePause : endBreak} onLeave={() => actions.handOver(studyId)} />
      {feedback && !paused && <TruthPanel lines={feedback.lines} practice={feedback.practice} onContinue={endFeedback} />}
      {notice?.kind === 'error' && <p className="reading-error" role="alert">{notice.text} <button type="button" onClick={actions.clearNotice}>OK</button></p>}
    </main>
  );
};
