/**
 * Puts the coordinator's screens behind the lock. Opening a reading session locks them (stored,
 * so a reload or a second window comes back locked); so does the chosen idle time on the
 * coordinator's side. The reader's own screens (reading, handover) are never behind it. Without a
 * passphrase nothing is locked, and the start page asks for one.
 */
import { useCallback, useEffect, useRef, useState, type ReactNode } from 'react';
import { engageLock, type LockInfo } from '../../store/coordinator-lock';
import { useDb } from '../db-context';
import type { Screen } from '../state/app-state';
import { lockAtLaunch, lockSettledAtLaunch } from '../startup';
import { createIdleTimer } from './idle-timer';
import { LockScreen } from './LockScreen';
import { LockSetup } from './LockSetup';
import { LockSetupContext } from './lock-setup-slot';
import { isReaderFlow } from './reader-flow';

// put off for this window only: the start page asks again after a restart
let setupDismissed = false;

export const CoordinatorGate = ({ screen, children }: { screen: Screen; children: ReactNode }) => {
  const db = useDb();
  // the lock as read at launch when it has already arrived (src/ui/startup.ts): no "Opening…" first
  const [info, setInfo] = useState<LockInfo | null>(() => lockSettledAtLaunch() ?? null);
  const readAtLaunch = useRef(info !== null);
  const [dismissed, setDismissed] = useState(setupDismissed);
  // the first read is the one started at launch (src/ui/startup.ts)
  const refresh = useCallback(() => { lockAtLaunch(db).then(setInfo, () => setInfo(null)); }, [db]);
  const readerFlow = isReaderFlow(screen);

  // read again on every change of screen: another window may have locked in between (the first
  // screen's read is the launch's, when the gate started with it)
  const onScreen = useCallback(() => {
    if (readAtLaunch.current) { readAtLaunch.current = false; return; }
    refresh();
  }, [refresh]);
  useEffect(onScreen, [onScreen, screen]);

  useEffect(() => {
    if (screen.name !== 'read' || !info?.hasPassphrase || info.locked) return;
    engageLock(db, 'reading session opened').then(refresh, refresh);
  }, [db, screen.name, info, refresh]);

  useEffect(() => {
    if (readerFlow || !info?.hasPassphrase || info.locked) return;
    const timer = createIdleTimer(info.idleMinutes * 60_000, () => { engageLock(db, 'idle').then(refresh, refresh); });
    const events = ['pointerdown', 'keydown', 'wheel', 'pointermove'] as const;
    for (const name of events) window.addEventListener(name, timer.touch, { passive: true });
    return () => { timer.stop(); for (const name of events) window.removeEventListener(name, timer.touch); };
  }, [db, readerFlow, info, refresh]);

  if (readerFlow) return <>{children}</>;
  if (info === null) return <main className="page" aria-busy="true"><p>Opening…</p></main>;
  if (info.locked) return <LockScreen onOpen={refresh} />;
  const setupDue = screen.name === 'home' && !info.hasPassphrase && !dismissed;
  const setup = setupDue ? <LockSetup onSet={refresh} onDismiss={() => { setupDismissed = true; setDismissed(true); }} /> : null;
  return <LockSetupContext.Provider value={setup}>{children}</LockSetupContext.Provider>;
};
