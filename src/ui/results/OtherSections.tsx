/** Reading time, calibration, agreement between readers, and every figure of each reader's subgroups. */
import { useMemo } from 'react';
import type { GroupFinding } from '../../analysis/report-types';
import { calibrationPlot } from '../../io/plots/calibration-plot';
import { forestPlot } from '../../io/plots/forest-plot';
import { DASH, PALETTE, SYMBOL } from '../../io/plots/theme';
import { AIDED, calibrationPoints, timeRows, UNAIDED, type IndexedReader } from './figure-data';
import { figuresOf, GROUP_FIGURES, SECTION_FIGURES, SUBGROUP_FIGURES, type Topic } from './figure-list';
import { Disclosure, NumbersTable, type NumbersRow } from './NumbersTable';
import { PlotFigure } from './PlotFigure';
import { GroupFigures, Section } from './Section';

type Props = { g: GroupFinding; gi: number; readers: readonly IndexedReader[]; rows: readonly NumbersRow[] };

const CONDITION_SERIES = [
  { name: UNAIDED, color: PALETTE.unaided, symbol: SYMBOL.unaided, dash: DASH.unaided },
  { name: AIDED, color: PALETTE.aided, symbol: SYMBOL.aided, dash: DASH.aided },
];

export const TimeSection = ({ g, gi, readers, rows }: Props) => {
  const options = useMemo(() => forestPlot({ rows: timeRows(readers, g), series: CONDITION_SERIES, reference: null, xLabel: 'seconds per read →', width: 1000 }), [readers, g]);
  return (
    <Section id={`time-${gi}`} title="Reading time" lead={<>How long a read took, from the case appearing to the final call. Blue circles (solid): without the suggestion; orange triangles (dashed): with it. The dot is the median; the bar covers the middle half of reads.</>}>
      <PlotFigure title={`Reading time per reader, ${g.finding}`} file={`time-${g.finding}`} options={options} wide>
        Median and quartiles of each reader’s reads; the diamonds pool all readers.
      </PlotFigure>
      <Disclosure summary="Show the numbers: reading time">
        {() => <NumbersTable caption="Per reader, and all reads pooled" rows={rows} figures={figuresOf(SECTION_FIGURES, 'time')} />}
      </Disclosure>
    </Section>
  );
};

export const CalibrationSection = ({ g, gi, rows }: Props) => {
  const options = useMemo(() => calibrationPlot({ points: calibrationPoints(g), size: 300 }), [g]);
  return (
    <Section id={`calibration-${gi}`} title="Were readers’ stated likelihoods right?" lead={<>When readers said a finding was, say, 80% likely, was it present about 80% of the time? Points on the dotted diagonal mean yes; below it, readers were too sure it was present; above it, not sure enough.</>}>
      <div className="cards">
        <PlotFigure title={`Calibration of stated likelihood, ${g.finding}`} file={`calibration-${g.finding}`} options={options}>
          All readers pooled, in tenths of the 0–100 scale. Blue circles (solid): without the suggestion; orange triangles (dashed): with it.
        </PlotFigure>
      </div>
      <Disclosure summary="Show the numbers: calibration and Brier score">
        {() => <NumbersTable caption="Per reader, and all reads pooled" rows={rows} figures={figuresOf(SECTION_FIGURES, 'calibration')} />}
      </Disclosure>
    </Section>
  );
};

export const AgreementSection = ({ g, gi }: Props) => (
  <Section id={`agreement-${gi}`} title="Did readers agree with each other?" lead={<>Agreement between readers on the same cases beyond chance (Fleiss’ kappa: 0 is chance, 1 is full agreement), without and with the suggestion. A suggestion can raise agreement even when it is wrong.</>}>
    <GroupFigures caption="Agreement between readers" figures={figuresOf(GROUP_FIGURES, 'agreement')} root={g} base={`group.findings.${gi}.`} />
  </Section>
);

const TOPICS: readonly Topic[] = ['accuracy', 'auc', 'crossover', 'reliance', 'switching', 'caution', 'time', 'calibration'];

/** Every figure of each reader's subgroups (built only when opened). */
export const ReaderSubgroups = ({ g, readers }: Props) => {
  if (g.subgroups.length === 0) return null;
  return (
    <Disclosure summary="Every figure per reader and subgroup">
      {() => readers.map(({ entry, index }) => {
        const rows: NumbersRow[] = entry.subgroups.map((s, i) => ({ label: `${s.attribute}: ${s.value || '(empty)'}`, root: s, base: `readers.${index}.subgroups.${i}.` }));
        return (
          <div key={index} className="reader-subgroups">
            <h4>Reader {entry.reader_id}</h4>
            <NumbersTable caption={`${entry.reader_id}: suggestion accuracy and over-reliance`} rows={rows} figures={SUBGROUP_FIGURES} />
            {TOPICS.map((t) => <NumbersTable key={t} caption={`${entry.reader_id}: ${t}`} rows={rows} figures={figuresOf(SECTION_FIGURES, t)} />)}
          </div>
        );
      })}
    </Disclosure>
  );
};
