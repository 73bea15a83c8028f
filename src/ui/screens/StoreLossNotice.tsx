/** Says plainly, at the top of the start screen, that the browser lost Heed's earlier database. */
import { useState } from 'react';
import { dismissStoreLoss, originStorage, type StoreLoss } from '../services/store-loss';

const when = (iso: string): string => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

export const StoreLossNotice = ({ loss }: { loss: StoreLoss }) => {
  const [read, setRead] = useState(false);
  if (read) return null;
  return (
    <section className="panel panel-warn" role="alert" aria-labelledby="store-loss-head">
      <h2 id="store-loss-head">Heed’s earlier data is gone from this window</h2>
      <p>
        This window held a Heed database created on {when(loss.lostCreatedAt)} and last opened on {when(loss.lostLastSeen)}.
        At this start the browser gave Heed a new, empty one. Browsers delete a database they find damaged, for example
        after a crash or a power cut, and Heed cannot get it back from the browser.
      </p>
      <p>
        Restore each study from its latest backup in the Backups panel below, or open a study bundle you saved. Answers
        given after that backup or bundle was made are not in it: note which sessions to read again. The coordinator’s
        passphrase was kept in the lost database too: set it again.
      </p>
      <button type="button" onClick={() => { const s = originStorage(); if (s) dismissStoreLoss(s); setRead(true); }}>I have read this</button>
    </section>
  );
};
