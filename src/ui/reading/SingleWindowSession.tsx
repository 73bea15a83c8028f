/**
 * One window per reading session. A Web Lock named after the session is held while the reading
 * view is open; a second window (or tab) on the same session finds it taken and is told at once,
 * with "Take over here". Taking over tells the first window through a BroadcastChannel: it lets go
 * of the lock and hides its question, so it never stays on an answer already given elsewhere. The
 * reading view is mounted afresh on each take-over, so it starts from what the database holds.
 * Where Web Locks are missing (an old browser), the reading view is shown as before; the commit
 * still refuses an answer for a step that is no longer current.
 */
import { Fragment, useCallback, useEffect, useRef, useState, type ReactNode } from 'react';
import { signal } from '../signals';
import { blockBrowserShortcuts } from './browser-shortcuts';

type Ownership = 'checking' | 'owner' | 'elsewhere';
type Props = { sessionId: string; onHandBack: () => void; children: ReactNode };

const CHANNEL = 'heed-reading-session';
type TakeOver = { type: 'take-over'; sessionId: string };
const isTakeOver = (data: unknown, sessionId: string): boolean =>
  typeof data === 'object' && data !== null && (data as Partial<TakeOver>).type === 'take-over' && (data as Partial<TakeOver>).sessionId === sessionId;

export const SingleWindowSession = ({ sessionId, onHandBack, children }: Props) => {
  const supported = typeof navigator !== 'undefined' && 'locks' in navigator && typeof BroadcastChannel !== 'undefined';
  const [state, setState] = useState<Ownership>(supported ? 'checking' : 'owner');
  const [generation, setGeneration] = useState(0);
  // the current attempt: `live` turns false when the view goes away; `release` lets go of a held lock
  const attempt = useRef<{ live: boolean; release: (() => void) | null } | null>(null);
  const channel = useRef<BroadcastChannel | null>(null);

  const letGo = useCallback(() => {
    const current = attempt.current;
    attempt.current = null;
    if (!current) return;
    current.live = false;
    current.release?.();
  }, []);

  const acquire = useCallback((wait: boolean) => {
    letGo();
    const mine: { live: boolean; release: (() => void) | null } = { live: true, release: null };
    attempt.current = mine;
    void navigator.locks.request(`heed-session:${sessionId}`, wait ? {} : { ifAvailable: true }, (lock) => {
      if (!mine.live) return undefined;
      if (!lock) { setState('elsewhere'); return undefined; }
      setGeneration((g) => g + 1);
      setState('owner');
      return new Promise<void>((resolve) => { mine.release = resolve; });
    });
  }, [sessionId, letGo]);

  useEffect(() => {
    if (!supported) return undefined;
    const ch = new BroadcastChannel(CHANNEL);
    ch.onmessage = (event: MessageEvent<unknown>) => {
      if (!isTakeOver(event.data, sessionId) || !attempt.current?.release) return;
      letGo();
      setState('elsewhere');
    };
    channel.current = ch;
    acquire(false);
    return () => { letGo(); ch.close(); channel.current = null; };
  }, [supported, sessionId, acquire, letGo]);

  // DevTools and Reload shortcuts are cancelled while a reading session is on screen
  useEffect(() => blockBrowserShortcuts(window), []);

  useEffect(() => { if (state === 'elsewhere') signal('ready', { screen: 'session-elsewhere' }); }, [state]);

  const takeOver = () => {
    const message: TakeOver = { type: 'take-over', sessionId };
    channel.current?.postMessage(message);
    setState('checking');
    acquire(true);
  };

  if (state === 'owner') return <Fragment key={generation}>{children}</Fragment>;
  if (state === 'checking') return <main className="reading" aria-busy="true"><p>Opening the session…</p></main>;
  return (
    <main className="reading reading-elsewhere">
      <div className="reading-overlay" role="dialog" aria-modal="true" aria-label="Open in another window">
        <h2>This reading session is open in another window</h2>
        <p>Only one window can show a session, so that no question is answered twice. Every committed answer is saved.</p>
        <button type="button" onClick={takeOver} autoFocus>Take over here</button>
        <button type="button" className="link" onClick={onHandBack}>Hand back the workstation</button>
      </div>
    </main>
  );
};
