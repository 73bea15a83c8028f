/**
 * The one module that owns the app's state: which screen is open, and a notice line.
 * Screens change it only through the named actions below.
 */
import { useSyncExternalStore } from 'react';

export type Screen =
  | { name: 'home' }
  | { name: 'new-study' }
  | { name: 'study'; studyId: string }
  | { name: 'results'; studyId: string }
  | { name: 'read'; sessionId: string; studyId: string }
  /** between a reader and the coordinator: nothing of the study is on screen */
  | { name: 'handover'; studyId: string; readerId?: string }
  /** editing a draft study's design (refused once it is locked) */
  | { name: 'edit-study'; studyId: string }
  /** the study's event log, in time order */
  | { name: 'audit'; studyId: string }
  /** one reader's private report, opened by the coordinator */
  | { name: 'reader-report'; studyId: string; readerId: string };

export type Notice = { kind: 'info' | 'error'; text: string };

export type AppState = { screen: Screen; notice: Notice | null };

let state: AppState = { screen: { name: 'home' }, notice: null };
const listeners = new Set<() => void>();

/** An info notice fades after this long; an error stays until dismissed or the screen changes. */
export const NOTICE_MS = 6000;
let fadeTimer: ReturnType<typeof setTimeout> | null = null;

const set = (next: AppState): void => {
  if (next.notice !== state.notice && fadeTimer !== null) { clearTimeout(fadeTimer); fadeTimer = null; }
  state = next;
  const shown = next.notice;
  if (shown?.kind === 'info' && fadeTimer === null) {
    fadeTimer = setTimeout(() => { fadeTimer = null; if (state.notice === shown) set({ ...state, notice: null }); }, NOTICE_MS);
  }
  for (const listener of listeners) listener();
};

export const actions = {
  goHome: (): void => set({ screen: { name: 'home' }, notice: null }),
  newStudy: (): void => set({ screen: { name: 'new-study' }, notice: null }),
  openStudy: (studyId: string, notice: Notice | null = null): void => set({ screen: { name: 'study', studyId }, notice }),
  openResults: (studyId: string): void => set({ screen: { name: 'results', studyId }, notice: null }),
  startReading: (studyId: string, sessionId: string): void => set({ screen: { name: 'read', studyId, sessionId }, notice: null }),
  handOver: (studyId: string, readerId?: string): void => set({ screen: readerId === undefined ? { name: 'handover', studyId } : { name: 'handover', studyId, readerId }, notice: null }),
  openReaderReport: (studyId: string, readerId: string): void => set({ screen: { name: 'reader-report', studyId, readerId }, notice: null }),
  editStudy: (studyId: string): void => set({ screen: { name: 'edit-study', studyId }, notice: null }),
  openAuditLog: (studyId: string): void => set({ screen: { name: 'audit', studyId }, notice: null }),
  notify: (notice: Notice): void => set({ ...state, notice }),
  clearNotice: (): void => set({ ...state, notice: null }),
};

const subscribe = (listener: () => void): (() => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};

export const useAppState = (): AppState => useSyncExternalStore(subscribe, () => state);

/** The state now, outside React (tests, one-off reads). */
export const getAppState = (): AppState => state;
