/** How readers relied on the suggestion: over/under-reliance, switching, the caution notice, subgroups. */
import { useMemo } from 'react';
import type { GroupFinding } from '../../analysis/report-types';
import { forestPlot } from '../../io/plots/forest-plot';
import { subgroupPlot } from '../../io/plots/subgroup-plot';
import { PALETTE, SYMBOL } from '../../io/plots/theme';
import { cautionRows, relianceRows, subgroupPoints, switchingRows, WITH_NOTICE, WITHOUT_NOTICE, type IndexedReader } from './figure-data';
import { figuresOf, GROUP_FIGURES, SECTION_FIGURES, SUBGROUP_FIGURES } from './figure-list';
import { Disclosure, NumbersTable, type NumbersRow } from './NumbersTable';
import { PlotFigure } from './PlotFigure';
import { GroupFigures, Section } from './Section';

type Props = { g: GroupFinding; gi: number; readers: readonly IndexedReader[]; rows: readonly NumbersRow[] };

export const RelianceSection = ({ g, gi, readers, rows }: Props) => {
  const options = useMemo(() => forestPlot({ rows: relianceRows(readers, g), reference: null, domain: [0, 1], percent: true, xLabel: 'share of reads →', width: 1000 }), [readers, g]);
  if (!g.pooled.aided) return null;
  return (
    <Section id={`reliance-${gi}`} title="Following the suggestion when it was wrong, and turning it down when it was right" lead={<>Left panel: of the reads where the suggestion was wrong, the share where the reader went along with it (lower is better). Right panel: of the reads where it was right, the share where the reader went against it (lower is better). Lines are 95% intervals; wide lines mean few such reads.</>}>
      <PlotFigure title={`Over-reliance and under-reliance per reader, ${g.finding}`} file={`reliance-${g.finding}`} options={options} wide>
        Dots: each reader. Diamonds: the reader average (bootstrap interval) and all reads pooled (Wilson interval).
      </PlotFigure>
      <Disclosure summary="Show the numbers: reliance and agreement with the suggestion">
        {() => (<>
          <GroupFigures caption="Reader average (95% bootstrap interval)" figures={figuresOf(GROUP_FIGURES, 'reliance')} root={g} base={`group.findings.${gi}.`} />
          <NumbersTable caption="Per reader, and all reads pooled (95% Wilson intervals)" rows={rows} figures={figuresOf(SECTION_FIGURES, 'reliance')} />
        </>)}
      </Disclosure>
    </Section>
  );
};

export const SwitchingSection = ({ g, gi, readers, rows }: Props) => {
  const options = useMemo(() => forestPlot({ rows: switchingRows(readers, g), reference: null, domain: [0, 1], percent: true, xLabel: 'share of reads with a first call →', width: 1000 }), [readers, g]);
  if (!g.pooled.sequential) return null;
  return (
    <Section id={`switching-${gi}`} title="Changing the call after seeing the suggestion" lead={<>In sequential reading the reader gives a first call, then sees the suggestion, then gives a final call. These panels show how often the call changed, how often it moved to the suggestion, and whether changes went from wrong to right or from right to wrong.</>}>
      <PlotFigure title={`Switching per reader, ${g.finding}`} file={`switching-${g.finding}`} options={options} wide>
        Each panel is a share of the reads that had a first call, with its 95% Wilson interval; the diamond pools all readers.
      </PlotFigure>
      <Disclosure summary="Show the numbers: switching, RAIR, RSR and weight of advice">
        {() => <NumbersTable caption="Per reader, and all reads pooled" rows={rows} figures={figuresOf(SECTION_FIGURES, 'switching')} />}
      </Disclosure>
    </Section>
  );
};

const NOTICE_SERIES = [
  { name: WITH_NOTICE, color: PALETTE.aided, symbol: SYMBOL.aided, dash: '5,3' },
  { name: WITHOUT_NOTICE, color: PALETTE.unaided, symbol: SYMBOL.unaided, dash: '' },
];

export const CautionSection = ({ g, gi, readers, rows }: Props) => {
  const options = useMemo(() => forestPlot({ rows: cautionRows(readers, g), series: NOTICE_SERIES, reference: null, domain: [0, 1], percent: true, xLabel: 'share of wrong suggestions followed →', width: 1000 }), [readers, g]);
  const c = g.pooled.aided?.caution;
  if (!c) return null;
  if (c.shown.n === 0) {
    return (
      <Section id={`caution-${gi}`} title="The caution notice" lead={<>No read with a wrong suggestion showed the caution notice in this study, so there is nothing to compare.</>}>
        <Disclosure summary="Show the numbers: caution notice">
          {() => <NumbersTable caption="Per reader, and all reads pooled" rows={rows} figures={figuresOf(SECTION_FIGURES, 'caution')} />}
        </Disclosure>
      </Section>
    );
  }
  return (
    <Section id={`caution-${gi}`} title="The caution notice: with against without" lead={<>Did showing the note about the model’s limits make readers follow a wrong suggestion less often? Orange triangles (dashed): reads with the notice; blue circles (solid): reads without it.</>}>
      <PlotFigure title={`Over-reliance with and without the caution notice, ${g.finding}`} file={`caution-${g.finding}`} options={options} wide>
        Of the reads where the suggestion was wrong, the share followed, with 95% Wilson intervals.
      </PlotFigure>
      <Disclosure summary="Show the numbers: caution notice">
        {() => <NumbersTable caption="Per reader, and all reads pooled" rows={rows} figures={figuresOf(SECTION_FIGURES, 'caution')} />}
      </Disclosure>
    </Section>
  );
};

export const SubgroupSection = ({ g, gi }: Props) => {
  const points = useMemo(() => subgroupPoints(g), [g]);
  const options = useMemo(() => subgroupPlot({ points, width: 620 }), [points]);
  if (g.subgroups.length === 0) return null;
  const base = `group.findings.${gi}.subgroups.`;
  const rows: NumbersRow[] = g.subgroups.map((s, i) => ({ label: `${s.attribute}: ${s.value || '(empty)'}`, root: s, base: `${base}${i}.` }));
  return (
    <Section id={`subgroups-${gi}`} title="Where the model is weaker, do readers follow it more?" lead={<>Each point is one kind of case (a value of a case attribute, such as the scanner). Further left, the suggestion was right less often there; higher up, readers followed its wrong suggestions more often there.</>}>
      {points.length > 0 && <div className="cards"><PlotFigure title={`Model accuracy against readers’ over-reliance, ${g.finding}`} file={`subgroups-${g.finding}`} options={options}>
        Green solid line: 95% interval of the suggestion’s accuracy; vermilion dashed line: 95% interval of over-reliance (all readers pooled).
      </PlotFigure></div>}
      <Disclosure summary="Show the numbers: subgroups (all readers pooled)">
        {() => (<>
          <NumbersTable caption="Suggestion accuracy and over-reliance" rows={rows} figures={SUBGROUP_FIGURES} />
          {(['accuracy', 'auc', 'crossover', 'reliance', 'switching', 'caution', 'time', 'calibration'] as const).map((topic) => (
            <NumbersTable key={topic} caption={`Subgroups: ${topic}`} rows={rows} figures={figuresOf(SECTION_FIGURES, topic)} />
          ))}
        </>)}
      </Disclosure>
    </Section>
  );
};
