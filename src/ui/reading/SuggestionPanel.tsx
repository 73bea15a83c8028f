/** The model's suggestion as the study shows it, and the caution notice when this read has one. */
import type { Bit } from '../../core/read-log';

type Props = { call: Bit; score: number | null; caution: string | null };

export const SuggestionPanel = ({ call, score, caution }: Props) => (
  <section className="suggestion" aria-label="Model suggestion">
    <h2>Model suggestion</h2>
    <p className="suggestion-call">{call === 1 ? 'Present' : 'Absent'}</p>
    {score !== null && <p className="suggestion-score">score {score.toFixed(2)}</p>}
    {caution && <p className="suggestion-caution" role="note">{caution}</p>}
  </section>
);
