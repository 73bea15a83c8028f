/** The pause, break and practice-over covers (image hidden, clock stopped), and the end-of-period screen. */
export type Interlude = 'break' | 'practice-over';

type OverlayProps = { paused: boolean; interlude: Interlude | null; onContinue: () => void; onLeave: () => void };

const WORDS = {
  paused: { name: 'Paused', title: 'Paused', text: 'The clock is stopped and the image is hidden.' },
  break: { name: 'Break', title: 'Time for a short break', text: 'Rest your eyes. The clock starts again with the next case.' },
  'practice-over': { name: 'Practice over', title: 'Practice over: the study cases begin', text: 'From here on your answers count towards the study.' },
} as const;

export const ReadingOverlay = ({ paused, interlude, onContinue, onLeave }: OverlayProps) => {
  if (!paused && interlude === null) return null;
  const words = paused ? WORDS.paused : WORDS[interlude ?? 'break'];
  return (
    <div className="reading-overlay" role="dialog" aria-modal="true" aria-label={words.name}>
      <h2>{words.title}</h2>
      <p>{words.text}</p>
      <button type="button" onClick={onContinue} autoFocus>Continue <kbd>{paused ? 'Esc' : 'Enter'}</kbd></button>
      {paused && <button type="button" className="link" onClick={onLeave}>Leave the session (every committed answer is saved; it resumes at this case)</button>}
    </div>
  );
};

type DoneProps = { readerCode: string; period: number; onBack: () => void };

export const ReadingDone = ({ readerCode, period, onBack }: DoneProps) => (
  <main className="reading reading-done">
    <h1>Period {period} complete</h1>
    <p>Thank you, {readerCode}. Every answer is saved.</p>
    <button type="button" onClick={onBack}>Done: hand back the workstation</button>
  </main>
);
