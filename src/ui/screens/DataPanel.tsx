/** Where Heed keeps its data on this workstation, and whether the browser may evict it. */
import { useCallback } from 'react';
import { getHost } from '../../host';
import { dataLocation } from '../services/data-location';
import { megabytes, persistentStorage } from '../services/storage-status';
import { useAsync } from '../use-async';

export const DataPanel = () => {
  const status = useAsync(useCallback(() => persistentStorage(), []));
  const location = dataLocation(getHost().kind, window.location.search, window.location.origin);
  const s = status.value;
  return (
    <section className="panel" aria-labelledby="data-head">
      <h2 id="data-head">Where the data is</h2>
      <p>{location.here}</p>
      <p aria-label="Storage engine">{location.engine}</p>
      <p className="muted">Other ways of starting Heed keep their own data: {location.elsewhere.join('; ')}.</p>
      <p aria-label="Persistent storage">
        {s === undefined ? 'Asking the browser for persistent storage…'
          : s.persisted === null ? 'This browser does not say whether it may clear Heed’s data.'
            : s.persisted ? 'Persistent storage: granted. The browser will not clear Heed’s database when the disk runs low.'
              : 'Persistent storage: not granted. The browser may clear Heed’s database when the disk runs low; export read logs after each session.'}
        {s && s.usage !== null && ` Heed uses ${megabytes(s.usage)}${s.quota !== null ? ` of the ${megabytes(s.quota)} the browser allows` : ''}.`}
      </p>
    </section>
  );
};
