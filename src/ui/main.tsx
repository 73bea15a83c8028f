import { createRoot } from 'react-dom/client';
import { openHeedDb } from '../store/db';
import { App } from './App';
import { DbProvider } from './db-context';
import { signal } from './signals';
import { drawWhenSettled, FIRST_RENDER_WAIT_MS, launchSettled, startLoading } from './startup';
import './styles.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root');
const db = openHeedDb();
startLoading(db);
// the first render waits (a little) for the launch's queries, so the start screen is drawn once;
// `answered` says whether they had (test/e2e/warm-open.e2e.ts)
drawWhenSettled(launchSettled(), (answered) => {
  createRoot(root).render(
    <DbProvider db={db}>
      <App />
    </DbProvider>,
  );
  signal('mounted', { answered });
}, FIRST_RENDER_WAIT_MS);
