/** Says plainly, at the top of the start screen, that the browser lost Heed's earlier database. */
import { useState } from 'react';
import type { LostStore } from '../../store/records';
import { markLossRead } from '../../store/store-identity';
import { useDb } from '../db-context';
import { when } from './BackupsPanel';

export const StoreLossNotice = ({ loss }: { loss: LostStore }) => {
  const db = useDb();
  const [read, setRead] = useState(false);
  const [problem, setProblem] = useState('');
  if (read) return null;
  const confirm = () => {
    markLossRead(db).then(() => setRead(true), (e: unknown) => setProblem(`The notice could not be marked as read: ${e instanceof Error ? e.message : String(e)}`));
  };
  return (
    <section className="panel panel-warn" role="alert" aria-labelledby="store-loss-head">
      <h2 id="store-loss-head">The browser lost Heed’s studies on this workstation</h2>
      <p>
        Heed’s database on this workstation, created on {when(loss.createdAt)} and last opened on {when(loss.lastSeen)}, is
        gone: at this start the browser gave Heed a new, empty one. Browsers delete a database they find damaged, for
        example after a crash or a power cut, and Heed cannot get it back from the browser.
      </p>
      <p>
        To go on: import each study’s case set again from its original folder (backups hold no images; the demo case set
        is made again by itself), then restore each study from its latest backup in the Backups panel below, or open a
        study bundle you saved. Answers given after that backup or bundle was made are not in it: note which sessions to
        read again. The coordinator’s passphrase was kept in the lost database too: set it again.
      </p>
      <button type="button" onClick={confirm}>I have read this</button>
      {problem && <p role="status">{problem}</p>}
    </section>
  );
};
