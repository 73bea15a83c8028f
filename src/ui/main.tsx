import { createRoot } from 'react-dom/client';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root');
createRoot(root).render(<main><h1>Heed</h1><p>Research and training tool, not a medical device.</p></main>);
