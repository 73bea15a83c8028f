/** The study setting: show each reader their own report at the end of their last period. */
import { useState } from 'react';
import type { StoredStudy } from '../../store/records';
import { setShowReportToReader } from '../../store/report-setting';
import { useDb } from '../db-context';
import { actions } from '../state/app-state';

export const ReportSetting = ({ study, onChanged }: { study: StoredStudy; onChanged: () => void }) => {
  const db = useDb();
  const [on, setOn] = useState(study.showReportToReader === true);
  const change = async (next: boolean) => {
    setOn(next);
    try {
      await setShowReportToReader(db, study.id, next);
      onChanged();
    } catch (e) {
      setOn(!next);
      actions.notify({ kind: 'error', text: `The setting was not changed: ${e instanceof Error ? e.message : String(e)}` });
    }
  };
  return (
    <section className="panel" aria-labelledby="reports-head">
      <h2 id="reports-head">Readers’ reports</h2>
      <label><input type="checkbox" checked={on} onChange={(e) => void change(e.target.checked)} /> Show each reader their own report on the thank-you screen after their last period</label>
      <p className="muted">Each report is private to its reader: other readers appear only as unnamed dots and a range. You can open any reader’s report from the Readers table, print it to PDF or save it as an HTML file. Reports are feedback for learning, not appraisal.</p>
    </section>
  );
};
