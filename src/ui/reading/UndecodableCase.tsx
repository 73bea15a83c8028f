/**
 * Shown instead of the image when a case's image cannot be decoded in this browser. The reader is
 * never stuck: they may skip the case (logged with the reason) or pause and hand the workstation
 * back to the coordinator. The clock of this case never started, so no time is counted for it.
 */
type Props = { onSkip: () => void; onHandBack: () => void; busy: boolean };

export const UndecodableCase = ({ onSkip, onHandBack, busy }: Props) => (
  <div className="reading-overlay" role="dialog" aria-modal="true" aria-label="Image cannot be shown">
    <h2>This case's image cannot be shown</h2>
    <p>The picture could not be opened on this computer. This is not your doing, and no time is counted for this case.</p>
    <p>You can skip this case (it is noted in the study log), or pause and hand the workstation back to the coordinator.</p>
    <button type="button" onClick={onSkip} disabled={busy} autoFocus>Skip this case</button>
    <button type="button" onClick={onHandBack} disabled={busy}>Pause and hand back</button>
  </div>
);
