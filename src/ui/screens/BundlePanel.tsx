/** The study page's bundle actions: save the whole study as one file, and merge another workstation's copy. */
import { useState } from 'react';
import { writeBundleAsync } from '../../io/bundle/write';
import { gatherStudySnapshot, mergeStudyBundle } from '../../store/bundle';
import type { StoredStudy } from '../../store/records';
import { getHost } from '../../host';
import { useBusyAction } from '../components/use-busy-action';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { backUpStudy } from '../services/backup';

type Props = { study: StoredStudy; onMerged: () => void };

const safeName = (name: string): string => name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-|-$/g, '') || 'study';

export const BundlePanel = ({ study, onMerged }: Props) => {
  const db = useDb();
  const [withImages, setWithImages] = useState(false);
  const [status, setStatus] = useState('');
  const { busy, problem, setProblem, run, picked } = useBusyAction();

  const save = () => run(async () => {
    try {
      const file = `${safeName(study.name)}-bundle.zip`;
      const bytes = await writeBundleAsync(await gatherStudySnapshot(db, study.id, withImages));
      const result = await getHost().saveFile(file, bytes, 'application/zip');
      setStatus(result.handedTo === 'downloads' ? `${file} handed to the browser's downloads.` : result.saved ? `Saved ${file}${result.where ? ` to ${result.where}` : ''}.` : 'Not saved.');
      signal('saved', { file });
    } catch (e) {
      actions.notify({ kind: 'error', text: `The bundle was not saved: ${e instanceof Error ? e.message : String(e)}` });
    }
  });

  const backUp = () => run(async () => {
    const outcome = await backUpStudy(db, study.id, 'on-demand');
    if (outcome.ok) setStatus(`Backed up to ${outcome.folder}/${outcome.entry.id} (${outcome.entry.bytes.toLocaleString('en')} bytes).`);
    else setProblem(outcome.message);
  });

  const merge = picked(async (name, bytes) => {
    const outcome = await mergeStudyBundle(db, study.id, name, bytes);
    if (!outcome.ok) setProblem(outcome.message);
    else {
      setStatus(outcome.added === 0 ? `${name} holds nothing new: the study is unchanged.` : `Merged ${name}: ${outcome.added} read${outcome.added === 1 ? '' : 's'} added.`);
      onMerged();
    }
    signal('saved', { merged: name, ok: outcome.ok });
  });

  return (
    <section className="panel" aria-labelledby="bundle-head">
      <h2 id="bundle-head">Study bundle</h2>
      <p className="muted">One file with the whole study (design, readers, every answer and event, each chained by a hash so any later edit shows), to move it to another workstation, merge workstations, or keep as a backup. Heed also writes one to its backup folder (named on the start screen) whenever a period is complete.</p>
      <div className="form-actions">
        <label><input type="checkbox" checked={withImages} onChange={(e) => setWithImages(e.target.checked)} /> include the case images</label>
        <button type="button" disabled={busy} onClick={() => void save()}>Save study bundle</button>
        <button type="button" disabled={busy} onClick={() => void backUp()}>Back up now</button>
        <label>
          Merge a workstation’s bundle
          <input type="file" accept=".zip,application/zip" disabled={busy} onChange={merge} />
        </label>
      </div>
      {problem && <p role="alert">{problem}</p>}
      <p className="muted" aria-live="polite">{status}</p>
    </section>
  );
};
