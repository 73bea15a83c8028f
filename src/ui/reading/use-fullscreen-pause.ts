/**
 * Full screen for the reading view, with pausing that works in and out of it. In full screen the
 * browser takes the first Esc to leave full screen and the page never sees the key, so the clock
 * would keep running: where the Keyboard Lock API exists, Esc is locked while in full screen (the
 * page gets it and pauses; holding Esc still leaves full screen), and in any case leaving full
 * screen other than by the reading view's own toggle pauses the reading.
 */
import { useCallback, useEffect, useRef } from 'react';

type KeyboardLock = { lock?: (keys: string[]) => Promise<void>; unlock?: () => void };

const keyboardLock = (): KeyboardLock | undefined => (navigator as Navigator & { keyboard?: KeyboardLock }).keyboard;

export const useFullscreenPause = (pause: () => void): (() => void) => {
  const leavingByToggle = useRef(false);
  const pauseRef = useRef(pause);
  useEffect(() => { pauseRef.current = pause; }, [pause]);

  useEffect(() => {
    const onChange = () => {
      if (document.fullscreenElement) {
        keyboardLock()?.lock?.(['Escape']).catch(() => undefined);
        return;
      }
      keyboardLock()?.unlock?.();
      if (leavingByToggle.current) leavingByToggle.current = false;
      else pauseRef.current();
    };
    document.addEventListener('fullscreenchange', onChange);
    return () => document.removeEventListener('fullscreenchange', onChange);
  }, []);

  return useCallback(() => {
    if (document.fullscreenElement) {
      leavingByToggle.current = true;
      document.exitFullscreen().catch(() => { leavingByToggle.current = false; });
    } else {
      document.documentElement.requestFullscreen().catch(() => undefined);
    }
  }, []);
};
