/**
 * The bootstrap seed and number of resamples. A change applies by itself once typing pauses
 * (debounced) or at once on Enter; a value that is not allowed is named beside its field and not applied.
 */
import { useEffect, useRef, useState } from 'react';

export const APPLY_AFTER_MS = 600;

type FieldProps = { label: string; value: number; min: number; onApply: (n: number) => void };

const NumberField = ({ label, value, min, onApply }: FieldProps) => {
  const [text, setText] = useState(String(value));
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const parsed = /^-?\d+$/.test(text.trim()) ? Number(text.trim()) : Number.NaN;
  const problem = Number.isSafeInteger(parsed) && parsed >= min ? null : `${label} must be a whole number${min > Number.MIN_SAFE_INTEGER ? ` of at least ${min}` : ''}.`;
  const apply = () => { if (problem === null && parsed !== value) onApply(parsed); };
  useEffect(() => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(apply, APPLY_AFTER_MS);
    return () => { if (timer.current) clearTimeout(timer.current); };
  });
  const id = `opt-${label.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <label>
      {label}
      <input inputMode="numeric" value={text} aria-invalid={problem !== null} aria-describedby={problem ? `${id}-problem` : undefined}
        onChange={(e) => setText(e.target.value)} onKeyDown={(e) => { if (e.key === 'Enter') apply(); }} />
      {problem && <small id={`${id}-problem`} className="form-problem">{problem}</small>}
    </label>
  );
};

export const AnalysisOptions = ({ seed, boot, onSeed, onBoot, busy }: { seed: number; boot: number; onSeed: (n: number) => void; onBoot: (n: number) => void; busy: boolean }) => (
  <section className="panel form form-row analysis-options" aria-label="Analysis options">
    <NumberField label="Bootstrap seed" value={seed} min={Number.MIN_SAFE_INTEGER} onApply={onSeed} />
    <NumberField label="Resamples" value={boot} min={0} onApply={onBoot} />
    <p className="muted" aria-live="polite">
      {busy ? 'Computing…' : <>The same numbers as <code>heed analyze reads.csv --seed {seed} --boot {boot}</code> on this study’s exported read log. Practice reads are left out.</>}
    </p>
  </section>
);
