/**
 * A slider styled for the dark reading room. Until a value is chosen it shows no thumb and says
 * "not set", so it never looks set at its midpoint; a click anywhere on it, or a key, sets it.
 */
type Props = {
  label: string;
  value: number | null;
  min: number;
  max: number;
  step: number;
  disabled: boolean;
  valueText: (value: number) => string;
  onChange: (value: number) => void;
};

export const ScaleSlider = (p: Props) => {
  const unset = p.value === null;
  return (
    <input
      type="range" min={p.min} max={p.max} step={p.step} value={p.value ?? (p.min + p.max) / 2} disabled={p.disabled}
      aria-label={p.label} aria-valuetext={p.value === null ? 'not set' : p.valueText(p.value)}
      className={unset ? 'dark-range unset' : 'dark-range'} data-state={unset ? 'unset' : 'set'}
      onChange={(e) => p.onChange(Number(e.target.value))}
      // a click at the resting midpoint changes nothing, so an unset slider takes the click itself
      onClick={(e) => { if (unset) p.onChange(Number(e.currentTarget.value)); }}
    />
  );
};
