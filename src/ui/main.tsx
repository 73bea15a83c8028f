import { createRoot } from 'react-dom/client';
import { openHeedDb } from '../store/db';
import { App } from './App';
import { DbProvider } from './db-context';
import { signal } from './signals';
import { startLoading } from './startup';
import './styles.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root');
const db = openHeedDb();
startLoading(db);
createRoot(root).render(
  <DbProvider db={db}>
    <App />
  </DbProvider>,
);
signal('mounted');
