/** The reading view's keys, as named actions. Kept pure so the mapping is tested on its own. */
import type { AnswerScaleKind } from '../../core/answer-scale';
import type { Bit } from '../../core/read-log';

export type KeyAction =
  | { kind: 'call'; call: Bit }
  | { kind: 'confidence'; value: number }
  | { kind: 'confidence-step'; step: number }
  | { kind: 'rating'; value: number }
  | { kind: 'rating-step'; step: number }

  | { kind: 'commit' }
  | { kind: 'pause' }
  | { kind: 'zoom'; factor: number }
  | { kind: 'reset-view' }
  | { kind: 'image'; step: number }
  | { kind: 'fullscreen' };

// The answer keys of each scale: call-confidence P/A, 1-9 → 10-90 and 0 → 100 confidence;
// five-point 1-5 the rating; percent 1-9 → 10-90, 0 → 0, Home/End 0/100; arrows step by 5.
const answerKey = (key: string, scale: AnswerScaleKind): KeyAction | null => {
  if (scale === 'five-point') return /^[1-5]$/.test(key) ? { kind: 'rating', value: Number(key) } : null;
  if (scale === 'percent') {
    if (/^[0-9]$/.test(key)) return { kind: 'rating', value: Number(key) * 10 };
    if (key === 'Home') return { kind: 'rating', value: 0 };
    if (key === 'End') return { kind: 'rating', value: 100 };
    if (key === 'ArrowUp') return { kind: 'rating-step', step: 5 };
    if (key === 'ArrowDown') return { kind: 'rating-step', step: -5 };
    return null;
  }
  if (key === 'p' || key === 'P') return { kind: 'call', call: 1 };
  if (key === 'a' || key === 'A') return { kind: 'call', call: 0 };
  if (/^[0-9]$/.test(key)) return { kind: 'confidence', value: key === '0' ? 100 : Number(key) * 10 };
  if (key === 'ArrowUp') return { kind: 'confidence-step', step: 5 };
  if (key === 'ArrowDown') return { kind: 'confidence-step', step: -5 };
  return null;
};

export const readingKeyAction = (
  event: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'altKey'>,
  scale: AnswerScaleKind = 'call-confidence',
): KeyAction | null => {
  if (event.ctrlKey || event.metaKey || event.altKey) return null;
  const key = event.key;
  const answer = answerKey(key, scale);
  if (answer !== null) return answer;
  if (key === 'Enter') return { kind: 'commit' };
  if (key === 'Escape') return { kind: 'pause' };
  if (key === '+' || key === '=') return { kind: 'zoom', factor: 1.25 };
  if (key === '-' || key === '_') return { kind: 'zoom', factor: 0.8 };
  if (key === 'r' || key === 'R') return { kind: 'reset-view' };
  if (key === 'f' || key === 'F') return { kind: 'fullscreen' };
  if (key === '[') return { kind: 'image', step: -1 };
  if (key === ']') return { kind: 'image', step: 1 };
  return null;
};
