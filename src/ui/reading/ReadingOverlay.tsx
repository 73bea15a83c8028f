/** The pause and break covers (image hidden, clock stopped), and the end-of-period screen. */
type OverlayProps = { paused: boolean; onBreak: boolean; onContinue: () => void; onLeave: () => void };

export const ReadingOverlay = ({ paused, onBreak, onContinue, onLeave }: OverlayProps) => {
  if (!paused && !onBreak) return null;
  return (
    <div className="reading-overlay" role="dialog" aria-modal="true" aria-label={paused ? 'Paused' : 'Break'}>
      <h2>{paused ? 'Paused' : 'Time for a short break'}</h2>
      <p>{paused ? 'The clock is stopped and the image is hidden.' : 'Rest your eyes. The clock starts again with the next case.'}</p>
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
