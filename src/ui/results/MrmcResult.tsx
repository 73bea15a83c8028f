/**
 * The multi-reader result drawn our own way: the AUC difference as one picture with three
 * intervals, a sentence for each saying what it generalises to, warnings where the design is too
 * small or an interval had to be clipped, and the test statistics behind a disclosure.
 */
import { useMemo } from 'react';
import type { GroupFinding } from '../../analysis/report-types';
import { mrmcPlot } from '../../io/plots/mrmc-plot';
import { MIN_READERS_FOR_RANDOM, MRMC_QUESTIONS, mrmcRows } from './figure-data';
import { figuresOf, GROUP_FIGURES } from './figure-list';
import { FigureValue } from './FigureValue';
import { dec, signed } from './format';
import { Disclosure } from './NumbersTable';
import { PlotFigure } from './PlotFigure';
import { sureness } from './plain-words';

export const MrmcResult = ({ g, gi }: { g: GroupFinding; gi: number }) => {
  const base = `group.findings.${gi}.`;
  const rows = useMemo(() => mrmcRows(g), [g]);
  const options = useMemo(() => (rows.length > 0 ? mrmcPlot({ rows, width: 1000 }) : null), [rows]);
  const m = g.mrmc;
  if (m === null || options === null) {
    return (
      <div className="mrmc">
        <h4>Multi-reader result</h4>
        <p className="muted" data-path={`${base}mrmc_note`}>Not available for this study: {g.mrmc_note ?? 'no reason given'}. It needs every reader to read every case both without and with the suggestion.</p>
      </div>
    );
  }
  const clipped = rows.filter((r) => r.clippedLower || r.clippedUpper);
  return (
    <div className="mrmc">
      <h4>Multi-reader result: the AUC difference and what it generalises to</h4>
      {g.readers < MIN_READERS_FOR_RANDOM && (
        <p className="warning-box" role="note">
          Only {g.readers} readers: the “other readers, other cases” result needs at least {MIN_READERS_FOR_RANDOM} readers to estimate how much readers differ, so treat it as a rough guide. (Rule: common practice, no published source found.)
        </p>
      )}
      {clipped.length > 0 && (
        <p className="warning-box" role="note">
          {clipped.map((r) => r.label).join('; ')}: the interval reaches past what an AUC difference can be (−1 to +1) and is drawn cut at the limit (open circle). The design is too small for a useful interval there.
        </p>
      )}
      <PlotFigure title={`Multi-reader AUC difference, ${g.finding}`} file={`multi-reader-${g.finding}`} options={options} wide>
        The diamond is the reader-averaged AUC with the suggestion minus without ({signed(m.random.difference, 3)}). Each line is its 95% interval for one question; if a line crosses the dashed zero line, no change is also consistent with the data.
      </PlotFigure>
      <ul className="mrmc-sentences">
        {MRMC_QUESTIONS.map(({ key, label, sentence }) => {
          const t = m[key];
          return (
            <li key={key}>
              <strong>{label}:</strong> {dec(Math.max(-1, t.lower), 3)} to {dec(Math.min(1, t.upper), 3)}{t.lower < -1 || t.upper > 1 ? ' (clipped)' : ''}. This interval {sentence} Here {sureness(t.lower, t.upper)}.
            </li>
          );
        })}
      </ul>
      <Disclosure summary="Test statistics (for the statistician)">
        {() => (
          <>
            <table className="grid numbers-table">
              <caption>Obuchowski-Rockette analysis with Hillis degrees of freedom; covariances by the case jackknife</caption>
              <thead><tr><th scope="col">Question</th><th scope="col">Difference</th><th scope="col">SE</th><th scope="col">95% interval</th><th scope="col">F</th><th scope="col">df1</th><th scope="col">ddf</th><th scope="col">p</th></tr></thead>
              <tbody>
                {MRMC_QUESTIONS.map(({ key, label }) => {
                  const t = m[key];
                  const p = `${base}mrmc.${key}`;
                  return (
                    <tr key={key}>
                      <th scope="row">{label}</th>
                      <td data-path={`${p}.difference`} data-value={t.difference}>{signed(t.difference, 4)}</td>
                      <td data-path={`${p}.se`} data-value={t.se}>{dec(t.se, 4)}</td>
                      <td data-path={p} data-key="difference" data-value={t.difference} data-lower={t.lower} data-upper={t.upper}>{dec(t.lower, 4)} to {dec(t.upper, 4)}</td>
                      <td data-path={`${p}.f`} data-value={t.f}>{dec(t.f, 3)}</td>
                      <td data-path={`${p}.df1`} data-value={t.df1}>{t.df1}</td>
                      <td data-path={`${p}.ddf`} data-value={Number.isFinite(t.ddf) ? t.ddf : 'null'}>{Number.isFinite(t.ddf) ? dec(t.ddf, 2) : '∞'}</td>
                      <td data-path={`${p}.p`} data-value={t.p}>{t.p < 0.0001 ? '< 0.0001' : dec(t.p, 4)}</td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
            <table className="grid numbers-table group-figures">
              <caption>Inputs of the analysis</caption>
              <tbody>
                {figuresOf(GROUP_FIGURES, 'mrmc').filter((f) => !f.path.startsWith('mrmc.random') && !f.path.startsWith('mrmc.fixed')).map((f) => (
                  <tr key={f.path}><th scope="row">{f.label}</th><td><FigureValue def={f} root={g} base={base} /></td></tr>
                ))}
              </tbody>
            </table>
          </>
        )}
      </Disclosure>
    </div>
  );
};
