/**
 * The coordinator's results as pictures with plain words: for each finding a headline, then ROC
 * curves, the change with the suggestion and the multi-reader result, reliance, switching, the
 * caution notice, subgroups, reading time, calibration and agreement; each section opens with a
 * plain line and keeps its numbers one click away; a glossary names every method's source.
 */
import { useMemo } from 'react';
import type { AnalysisReport } from '../../analysis/report-types';
import type { FindingRoc } from '../../analysis/roc-curves';
import { POOLED, readersOf } from './figure-data';
import { figuresOf, GROUP_FIGURES, LOG_FIGURES } from './figure-list';
import { GLOSSARY } from './glossary';
import { Disclosure, type NumbersRow } from './NumbersTable';
import { AgreementSection, CalibrationSection, ReaderSubgroups, TimeSection } from './OtherSections';
import { ChangeSection, RocSection } from './PerformanceSections';
import { headline } from './plain-words';
import { CautionSection, RelianceSection, SubgroupSection, SwitchingSection } from './RelianceSections';
import { GroupFigures } from './Section';
import './results.css';

const FindingResults = ({ report, gi, roc }: { report: AnalysisReport; gi: number; roc: FindingRoc | null }) => {
  const g = report.group.findings[gi];
  const readers = useMemo(() => (g ? readersOf(report, g.finding) : []), [report, g]);
  const rows = useMemo((): NumbersRow[] => (g ? [
    ...readers.map(({ entry, index }) => ({ label: entry.reader_id, root: entry, base: `readers.${index}.` })),
    { label: POOLED, root: g.pooled, base: `group.findings.${gi}.pooled.` },
  ] : []), [readers, g, gi]);
  if (!g) return null;
  const props = { g, gi, readers, rows };
  return (
    <section className="finding" aria-labelledby={`finding-${gi}`} data-finding={g.finding}>
      <h2 id={`finding-${gi}`}>Finding: {g.finding}</h2>
      <div className="headline" aria-label={`In short, ${g.finding}`}>
        <h3>In short</h3>
        <ul>{headline(g, readers).map((s) => <li key={s}>{s}</li>)}</ul>
        <Disclosure summary="Readers, cases and resamples behind these figures">
          {() => <GroupFigures caption="Design behind these figures" figures={figuresOf(GROUP_FIGURES, 'design')} root={g} base={`group.findings.${gi}.`} />}
        </Disclosure>
      </div>
      <RocSection {...props} roc={roc} />
      <ChangeSection {...props} roc={roc} />
      <RelianceSection {...props} />
      <SwitchingSection {...props} />
      <CautionSection {...props} />
      <SubgroupSection {...props} />
      <TimeSection {...props} />
      <CalibrationSection {...props} />
      <AgreementSection {...props} />
      <ReaderSubgroups {...props} />
    </section>
  );
};

export const Glossary = () => (
  <details className="panel glossary">
    <summary><h2>Glossary: what the words mean and where the methods come from</h2></summary>
    <dl>
      {GLOSSARY.map((e) => (
        <div key={e.term}><dt>{e.term}</dt><dd>{e.plain} <span className="source">Source: {e.source}</span></dd></div>
      ))}
    </dl>
  </details>
);

export const ResultsPage = ({ report, roc }: { report: AnalysisReport; roc: readonly FindingRoc[] | null }) => (
  <div className="results-page">
    {report.group.findings.length > 1 && (
      <nav aria-label="Findings" className="finding-nav">
        Findings: {report.group.findings.map((g, i) => <a key={g.finding} href={`#finding-${i}`}>{g.finding}</a>)}
      </nav>
    )}
    {report.group.findings.map((g, gi) => <FindingResults key={g.finding} report={report} gi={gi} roc={roc?.find((r) => r.finding === g.finding) ?? null} />)}
    <GroupFigures caption="This analysis" figures={LOG_FIGURES} root={report.group} base="group." />
    <Glossary />
  </div>
);
