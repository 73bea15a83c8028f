/** ROC curves, the change with the suggestion per reader, and the multi-reader result. */
import { useMemo } from 'react';
import type { FindingRoc } from '../../analysis/roc-curves';
import type { GroupFinding } from '../../analysis/report-types';
import { forestPlot } from '../../io/plots/forest-plot';
import { rocPlot, rocSmallMultiples, type RocLine } from '../../io/plots/roc-plot';
import { differenceRows, type IndexedReader } from './figure-data';
import { figuresOf, GROUP_FIGURES, SECTION_FIGURES } from './figure-list';
import { MrmcResult } from './MrmcResult';
import { Disclosure, NumbersTable, type NumbersRow } from './NumbersTable';
import { PlotFigure } from './PlotFigure';
import { GroupFigures, Section } from './Section';

type Props = { g: GroupFinding; gi: number; readers: readonly IndexedReader[]; rows: readonly NumbersRow[]; roc: FindingRoc | null };

const lines = (u: readonly { fpr: number; tpr: number }[] | null, a: readonly { fpr: number; tpr: number }[] | null): RocLine[] =>
  [...(u ? [{ condition: 'unaided' as const, points: u }] : []), ...(a ? [{ condition: 'aided' as const, points: a }] : [])];

export const RocSection = ({ g, gi, readers, rows, roc }: Props) => {
  const base = `group.findings.${gi}.`;
  const averaged = useMemo(() => (roc ? rocPlot({ lines: lines(roc.averaged.unaided, roc.averaged.aided), auc: { unaided: g.reader_averaged.unaided_auc.estimate, aided: g.reader_averaged.aided_auc.estimate }, size: 320 }) : null), [roc, g]);
  const multiples = useMemo(() => (roc && roc.readers.length > 1 ? rocSmallMultiples({ readers: roc.readers.map((r) => ({ reader: r.reader_id, lines: lines(r.unaided, r.aided) })), columns: Math.min(6, roc.readers.length) }) : null), [roc]);
  return (
    <Section id={`roc-${gi}`} title="Telling present from absent: ROC curves" lead={<>Each curve shows how well readers separate cases with the finding from cases without it; a curve higher and further left is better, the dotted diagonal is guessing. Blue solid: without the suggestion; orange dashed: with it.</>}>
      <div className="cards">
        {averaged && <PlotFigure title={`Reader-averaged ROC curves, ${g.finding}`} file={`roc-average-${g.finding}`} options={averaged}>
          The average of the readers’ curves (each reader counts once). The AUCs written on it are the reader averages below.
        </PlotFigure>}
        {multiples && <PlotFigure title={`ROC curve of each reader, ${g.finding}`} file={`roc-readers-${g.finding}`} options={multiples} wide={readers.length > 4}>
          One small square per reader, same colours and dashes.
        </PlotFigure>}
      </div>
      <Disclosure summary="Show the AUC numbers">
        {() => (<>
          <GroupFigures caption="Reader average (95% bootstrap interval)" figures={figuresOf(GROUP_FIGURES, 'auc')} root={g} base={base} />
          <NumbersTable caption="Per reader (95% DeLong interval)" rows={rows} figures={figuresOf(SECTION_FIGURES, 'auc')} />
        </>)}
      </Disclosure>
    </Section>
  );
};

export const ChangeSection = ({ g, gi, readers, rows }: Props) => {
  const base = `group.findings.${gi}.`;
  const options = useMemo(() => forestPlot({ rows: differenceRows(readers, g), reference: 0, xLabel: 'with suggestion − without →', width: 1000 }), [readers, g]);
  return (
    <Section id={`change-${gi}`} title="What changed with the suggestion" lead={<>Right of the dashed line, a reader did better with the suggestion; left of it, worse. Diamonds summarise all readers. Accuracy is a share of reads (0.10 = 10 points); AUC is the ability to separate cases.</>}>
      <PlotFigure title={`Change with the suggestion per reader, ${g.finding}`} file={`change-${g.finding}`} options={options} wide>
        Accuracy: each reader’s share right with minus without. AUC: each reader’s difference on the cases they read both ways, with its 95% interval (paired DeLong); open circles mark interval ends cut at −1 or +1. Below the readers: the reader average (bootstrap interval) and the multi-reader result.
      </PlotFigure>
      <Disclosure summary="Show the numbers: accuracy and cases read both ways">
        {() => (<>
          <GroupFigures caption="Reader average (95% bootstrap interval)" figures={figuresOf(GROUP_FIGURES, 'accuracy')} root={g} base={base} />
          <NumbersTable caption="Per reader, and all reads pooled" rows={rows} figures={figuresOf(SECTION_FIGURES, 'accuracy')} />
          <NumbersTable caption="Cases read both without and with the suggestion (crossover pairs)" rows={rows} figures={figuresOf(SECTION_FIGURES, 'crossover')} />
        </>)}
      </Disclosure>
      <MrmcResult g={g} gi={gi} />
    </Section>
  );
};
