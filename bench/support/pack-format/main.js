// The page of bench/support/pack-format.ts (plain JS, served as is).

const N = 2000, P = 100;
const iso = (i) => new Date(1.7e12 + i * 1000).toISOString();
const mkReads = (s) => Array.from({ length: N }, (_, i) => ({
  id: `reader-${s}/1/case-${i}/lesion`, sessionId: `reader-${s}/1`, studyId: 'study-x', readerId: `reader-${s}`, period: 1,
  caseId: `case-${i}`, finding: 'lesion', initial: { call: 1, confidence: 70, ms: 1234, rating: null },
  final: { call: i % 2, confidence: 80, ms: 2345, rating: null }, shownAt: iso(i), aiCall: 1, aiScore: 0.734, aiPlanted: false, cautionShown: false,
  hash: 'a'.repeat(64) }));
const cols = (rs) => ({ caseId: rs.map(r => r.caseId), finding: rs.map(r => r.finding), shownAt: rs.map(r => r.shownAt),
  initial: rs.map(r => r.initial ? [r.initial.call, r.initial.confidence, r.initial.ms, r.initial.rating ?? null] : null),
  final: rs.map(r => r.final ? [r.final.call, r.final.confidence, r.final.ms, r.final.rating ?? null] : null),
  aiCall: rs.map(r => r.aiCall), aiScore: rs.map(r => r.aiScore), aiPlanted: rs.map(r => r.aiPlanted ? 1 : 0), cautionShown: rs.map(r => r.cautionShown ? 1 : 0) });
const open = () => new Promise((res, rej) => { const r = indexedDB.open('fmt', 1); r.onupgradeneeded = () => { for (const s of ['objs','json','cols','colsjson','bytes']) r.result.createObjectStore(s); }; r.onsuccess = () => res(r.result); r.onerror = () => rej(r.error); });
const req = (r) => new Promise((res, rej) => { r.onsuccess = () => res(r.result); r.onerror = () => rej(r.error); });
const db = await open();
const out = {};
const enc = new TextEncoder(), dec = new TextDecoder();
if (location.search.includes('write')) {
  const tx = db.transaction(['objs','json','cols','colsjson','bytes'], 'readwrite');
  for (let s = 0; s < P; s++) { const rs = mkReads(s); const c = cols(rs);
    tx.objectStore('objs').put({ reads: rs }, s); tx.objectStore('json').put({ reads: JSON.stringify(rs) }, s);
    tx.objectStore('cols').put({ reads: c }, s); tx.objectStore('colsjson').put({ reads: JSON.stringify(c) }, s);
    tx.objectStore('bytes').put({ reads: enc.encode(JSON.stringify(c)) }, s); }
  await new Promise((res) => tx.oncomplete = res);
  out.written = true;
} else {
  for (const round of [1, 2]) for (const s of ['objs','json','cols','colsjson','bytes']) {
    const t0 = performance.now();
    const all = await req(db.transaction(s).objectStore(s).getAll());
    const t1 = performance.now();
    let n = 0;
    for (const p of all) { const v = s === 'json' || s === 'colsjson' ? JSON.parse(p.reads) : s === 'bytes' ? JSON.parse(dec.decode(p.reads)) : p.reads; n += Array.isArray(v) ? v.length : v.caseId.length; }
    out[`${s}#${round}`] = { getAllMs: Math.round(t1 - t0), parseMs: Math.round(performance.now() - t1), n, bytes: s === 'json' ? all[0].reads.length : undefined };
  }
}
window.done = out;
