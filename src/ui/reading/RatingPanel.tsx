/**
 * The answer on a rating scale: five buttons (keys 1-5) on the five-point scale, a slider with
 * keys on the percent scale. The call is not asked: it follows from the study's stated threshold,
 * which the panel says in words.
 */
import { callFromRating, thresholdWords, type AnswerScale } from '../../core/answer-scale';
import { ScaleSlider } from './ScaleSlider';

type Props = {
  question: string;
  scale: AnswerScale;
  rating: number | null;
  problem: string | null;
  busy: boolean;
  phaseLabel: string;
  onRating: (rating: number) => void;
  onCommit: () => void;
};

const callWords = (scale: AnswerScale, rating: number | null): string =>
  rating === null ? 'not set' : callFromRating(scale, rating) === 1 ? 'present' : 'absent';

export const RatingPanel = (p: Props) => (
  <section className="answer" aria-label={`Your ${p.phaseLabel}`}>
    <h2 className="answer-question">{p.question}</h2>
    {p.scale.kind === 'five-point' ? (
      <div className="answer-ratings" role="radiogroup" aria-label="Rating">
        {p.scale.labels.map((label, i) => (
          <button key={label} type="button" role="radio" aria-checked={p.rating === i + 1} className="call-button rating-button" disabled={p.busy} onClick={() => p.onRating(i + 1)}>
            <kbd>{i + 1}</kbd> {label}
          </button>
        ))}
      </div>
    ) : (
      <label className="answer-confidence">
        <span>Likelihood the finding is present: <output>{p.rating === null ? 'not set' : `${p.rating}%`}</output></span>
        <ScaleSlider label="Likelihood present" value={p.rating} min={0} max={100} step={1} disabled={p.busy} valueText={(v) => `${v}%`} onChange={p.onRating} />
        <small className="keys">keys: 1-9 set 10-90%, 0 sets 0%, End 100%, ↑ ↓ step 5</small>
      </label>
    )}
    <p className="answer-rule"><small>Counts as: <strong>{callWords(p.scale, p.rating)}</strong> ({thresholdWords(p.scale)})</small></p>
    <button type="button" className="commit-button" disabled={p.busy || p.problem !== null} onClick={p.onCommit}>
      Commit {p.phaseLabel} <kbd>Enter</kbd>
    </button>
    <p className="answer-problem" aria-live="polite">{p.problem ?? ''}</p>
  </section>
);
