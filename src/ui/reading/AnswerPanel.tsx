/** Call and confidence for one question; every control has a key and works by mouse too. */
import type { Bit } from '../../core/read-log';
import { ScaleSlider } from './ScaleSlider';

type Props = {
  question: string;
  call: Bit | null;
  confidence: number | null;
  askConfidence: boolean;
  problem: string | null;
  busy: boolean;
  phaseLabel: string;
  onCall: (call: Bit) => void;
  onConfidence: (confidence: number) => void;
  onCommit: () => void;
};

export const AnswerPanel = (p: Props) => (
  <section className="answer" aria-label={`Your ${p.phaseLabel}`}>
    <h2 className="answer-question">{p.question}</h2>
    <div className="answer-calls" role="radiogroup" aria-label="Call">
      <button type="button" role="radio" aria-checked={p.call === 1} className="call-button" disabled={p.busy} onClick={() => p.onCall(1)}>
        Present <kbd>P</kbd>
      </button>
      <button type="button" role="radio" aria-checked={p.call === 0} className="call-button" disabled={p.busy} onClick={() => p.onCall(0)}>
        Absent <kbd>A</kbd>
      </button>
    </div>
    {p.askConfidence && (
      <label className="answer-confidence">
        <span>Confidence in this call: <output>{p.confidence === null ? 'not set' : p.confidence}</output> <small>(0 guessing, 100 certain)</small></span>
        <ScaleSlider label="Confidence" value={p.confidence} min={0} max={100} step={5} disabled={p.busy} valueText={String} onChange={p.onConfidence} />
        <small className="keys">keys: 1-9 set 10-90, 0 sets 100, ↑ ↓ step 5</small>
      </label>
    )}
    <button type="button" className="commit-button" disabled={p.busy || p.problem !== null} onClick={p.onCommit}>
      Commit {p.phaseLabel} <kbd>Enter</kbd>
    </button>
    <p className="answer-problem" aria-live="polite">{p.problem ?? ''}</p>
  </section>
);
