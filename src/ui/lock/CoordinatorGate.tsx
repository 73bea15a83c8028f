/**
 * Puts the coordinator's screens behind the lock. Opening a reading session locks them (stored,
 * so a reload or a second window comes back locked); so does the chosen idle time on the
 * coordinator's side. The reader's own screens (reading, handover) are never behind it. Without a
 * passphrase nothing is locked, and the start page asks for one.
 */
import { useCallback, useEffect, useState, type ReactNode } from 'react';
import { engageLock, type LockInfo } from '../../store/coordinator-lock';
import { useDb } from '../db-context';
import type { Screen } from '../state/app-state';
import { lockAtLaunch } from '../startup';
import { createIdleTimer } from './idle-timer';
import { LockScreen } from './LockScreen';
import { LockSetup } from './LockSetup';
import { LockSetupContext } from './lock-setup-slot';
import { isReaderFlow } from './reader-flow';

// put off for this window only: the start page asks again after a restart
let setupDismissed = false;

export const CoordinatorGate = ({ screen, children }: { screen: Screen; children: ReactNode }) => {
  const db = useDb();
  const [info, setInfo] = useState<LockInfo | null>(null);
  const [dismissed, setDismissed] = useState(setupDismissed);
  // the first read is the one started at launch (src/ui/startup.ts)
  const refresh = useCallback(() => { lockAtLaunch(db).then(setInfo, () => setInfo(null)); }, [db]);
  const readerFlow = isReaderFlow(screen);

  // read again on every change of screen: another window may have locked in between
  useEffect(refresh, [refresh, screen]);

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
