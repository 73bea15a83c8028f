/** Exports: the read log, its data dictionary and the design record, saved through the host. */
import { useState } from 'react';
import { plantedList } from '../../core/planting';
import { studyJson } from '../../core/study-json';
import { dataDictionary } from '../../io/data-dictionary';
import { readLogCsv } from '../../io/read-log-export';
import { manifestFingerprint } from '../../store/fingerprint';
import { studyReadRows } from '../../store/read-log-rows';
import type { StoredCaseSet, StoredStudy } from '../../store/records';
import { getHost } from '../../host';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';

type Props = { study: StoredStudy; caseSet: StoredCaseSet; caution: string };

const safeName = (name: string): string => name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-|-$/g, '') || 'study';

export const ExportPanel = ({ study, caseSet, caution }: Props) => {
  const db = useDb();
  const [status, setStatus] = useState('');
  const save = async (file: string, make: () => Promise<string>, mime: string) => {
    try {
      const text = await make();
      const result = await getHost().saveFile(file, text, mime);
      setStatus(result.handedTo === 'downloads' ? `${file} handed to the browser's downloads.` : result.saved ? `Saved ${file}${result.where ? ` to ${result.where}` : ''}.` : 'Not saved.');
      signal('saved', { file });
    } catch (e) {
      actions.notify({ kind: 'error', text: `Export failed: ${e instanceof Error ? e.message : String(e)}` });
    }
  };
  const base = safeName(study.name);
  const attributes = caseSet.manifest.attributeNames;
  return (
    <section className="panel" aria-labelledby="export-head">
      <h2 id="export-head">Export</h2>
      <div className="form-actions">
        <button type="button" onClick={() => void save(`${base}-reads.csv`, async () => readLogCsv(await studyReadRows(db, study.id), attributes), 'text/csv')}>
          Save read log (reads.csv)
        </button>
        <button type="button" onClick={() => void save(`${base}-reads-dictionary.txt`, async () => dataDictionary(attributes), 'text/plain')}>
          Save data dictionary
        </button>
        <button type="button" onClick={() => void save(`${base}-study.json`, async () => studyJson(study.design, {
          studyId: study.id, caseSet: { name: caseSet.name, fingerprint: await manifestFingerprint(caseSet.manifest) }, planted: plantedList(study.suggestions),
        }), 'application/json')}>
          Save design record (study.json)
        </button>
      </div>
      <p className="muted" aria-live="polite">{status}</p>
      <p className="muted">{caution}</p>
    </section>
  );
};
