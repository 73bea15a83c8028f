/**
 * The truth after a case, in a training study or after a practice case: shown only once the
 * answers are committed, for learning (not appraisal); the reader continues with Enter.
 */
import type { TruthLine } from './truth-feedback';

type Props = { lines: TruthLine[]; practice: boolean; onContinue: () => void };

const word = (call: 0 | 1): string => (call === 1 ? 'present' : 'absent');

export const TruthPanel = ({ lines, practice, onContinue }: Props) => (
  <div className="reading-overlay truth" role="dialog" aria-modal="true" aria-label="The truth">
    <h2>{practice ? 'Practice case: the truth' : 'Training: the truth'}</h2>
    <ul className="truth-lines">
      {lines.map((l) => (
        <li key={l.finding} data-finding={l.finding} data-right={l.right ? 1 : 0}>
          <p>Finding “{l.finding}” was <strong>{word(l.truth)}</strong>.</p>
          <p>Your answer: {word(l.finalCall)}{l.rating !== null ? ` (rating ${l.rating})` : ''}: <strong>{l.right ? 'right' : 'not right'}</strong>.</p>
          {l.suggestion && (
            <p>The suggestion ({word(l.suggestion.call)}) was <strong>{l.suggestion.right ? 'right' : 'wrong'}</strong>; you <strong>{l.suggestion.followed ? 'followed it' : 'did not follow it'}</strong>.</p>
          )}
        </li>
      ))}
    </ul>
    <p className="muted">Feedback is for learning, not appraisal. Your answer is saved and cannot change.</p>
    <button type="button" onClick={onContinue} autoFocus>Continue <kbd>Enter</kbd></button>
  </div>
);
