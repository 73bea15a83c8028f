/** The start screen: the caution, the case sets, the studies, and any reading left unfinished. */
import { useCallback, useEffect, useState } from 'react';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { LockSetupSlot } from '../lock/lock-setup-slot';
import { signal } from '../signals';
import { preloadReading } from '../reading/load-reading';
import { homeAtLaunch, homeSettledAtLaunch } from '../startup';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';
import { BackupsPanel } from './BackupsPanel';
import { CaseSetList } from './CaseSetList';
import { DataPanel } from './DataPanel';
import { OpenBundle } from './OpenBundle';
import { StoreLossNotice } from './StoreLossNotice';

export const HomeScreen = () => {
  const db = useDb();
  // the first load is the one started at launch (src/ui/startup.ts); when it has already arrived,
  // the screen starts with it and is drawn once
  const [atLaunch] = useState(homeSettledAtLaunch);
  const home = useAsync(useCallback(() => homeAtLaunch(db), [db]), atLaunch);

  useEffect(() => {
    if (!home.value) return;
    signal('ready', { screen: 'home' });
    // a session can be resumed from here: fetch the reading view now, after the screen is shown
    if (home.value.unfinished.length > 0) preloadReading();
  }, [home.value]);

  return (
    <main className="page">
      <header className="page-head">
        <h1>Heed</h1>
        <p className="tagline">Local reading sessions that show how readers use a model’s suggestions.</p>
        <CautionLine />
      </header>
      {home.value?.storeLoss && <StoreLossNotice loss={home.value.storeLoss} />}
      <LockSetupSlot />
      {home.error && <p role="alert">Could not open the database: {home.error.message}</p>}
      {!home.value && !home.error && <p aria-busy="true">Opening Heed (on first launch the demo case set is generated: a few seconds)…</p>}
      {home.value && (
        <>
          {home.value.unfinished.length > 0 && (
            <section className="panel panel-accent" aria-labelledby="resume-head">
              <h2 id="resume-head">Unfinished reading</h2>
              <ul className="plain">
                {home.value.unfinished.map((u) => (
                  <li key={u.session.id}>
                    <button type="button" onClick={() => actions.startReading(u.session.studyId, u.session.id)}>
                      Resume {u.readerCode}, period {u.session.period} of “{u.studyName}”
                    </button>
                    <span className="muted"> {u.answeredCases} of {u.session.items.length} cases answered</span>
                  </li>
                ))}
              </ul>
            </section>
          )}
          <section className="panel" aria-labelledby="studies-head">
            <div className="panel-head">
              <h2 id="studies-head">Studies</h2>
              <button type="button" className="primary" onClick={actions.newStudy}>New study</button>
            </div>
            {home.value.studies.length === 0 ? <p className="muted">No study yet. Start one on the demo case set.</p> : (
              <ul className="plain">
                {home.value.studies.map((s) => (
                  <li key={s.id}>
                    <button type="button" className="link" onClick={() => actions.openStudy(s.id)}>{s.name}</button>
                    <span className="muted"> {home.value?.statuses.get(s.id) ?? ''}</span>
                  </li>
                ))}
              </ul>
            )}
          </section>
          <OpenBundle />
          <BackupsPanel studies={home.value.studies} />
          <CaseSetList caseSets={home.value.caseSets} onChanged={home.reload} />
          <DataPanel />
        </>
      )}
    </main>
  );
};
