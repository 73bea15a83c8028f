"""
Summarises a Chrome trace of the reading benchmark (HEED_BENCH_TRACE=file.json npx tsx bench/reading-latency.ts):
for each answer commit (an IndexedDB transaction with a put), its lifetime in the IndexedDB backend, the time from
the Enter keydown to its start, how busy the renderer main thread was during it, the backend work in it and the
write to disk (CommitPhaseTwo), then what the main thread did during the commits, by trace event name.
Run: python3 bench/support/commit-trace-summary.py file.json (Python 3 standard library only).
"""
import json, sys, statistics as st
d=json.load(open(sys.argv[1]))
ev=d['traceEvents'] if isinstance(d,dict) else d
names={}
for e in ev:
    if e.get('ph')=='M' and e.get('name')=='thread_name':
        names[(e['pid'],e['tid'])]=e['args']['name']
life=sorted((e['ts'],e['ph']) for e in ev if e.get('name')=='Transaction::lifetime')
spans=[];open_=None
for ts,ph in life:
    if ph=='b': open_=ts
    elif open_ is not None: spans.append((open_,ts)); open_=None
puts=[e['ts'] for e in ev if e.get('name')=='Database::PutOperation']
commits=[s for s in spans if any(s[0]<=p<=s[1] for p in puts)]
main=[e for e in ev if e.get('ph')=='X' and e.get('name')=='ThreadControllerImpl::RunTask' and names.get((e['pid'],e['tid']))=='CrRendererMain']
def busy(lo,hi):
    return sum(max(0,min(e['ts']+e.get('dur',0),hi)-max(e['ts'],lo)) for e in main)/1000
def named(n,lo,hi):
    return sum(e.get('dur',0) for e in ev if e.get('name')==n and lo<=e['ts']<=hi)/1000
kd=sorted(e['ts'] for e in ev if e.get('name')=='EventDispatch' and e.get('args',{}).get('data',{}).get('type')=='keydown')
rows=[]
for (a,b) in commits:
    k=max([t for t in kd if t<=a], default=a)
    rows.append(((b-a)/1000,(a-k)/1000,busy(a,b),named('Transaction::RunTasks',a,b)+named('Transaction::DoPendingCommit',a,b),named('BackingStore::Transaction::CommitPhaseTwo',a,b)))
print(f"{len(rows)} commit transactions")
for lab,i in [('transaction lifetime (backend)',0),('Enter keydown to transaction start',1),('renderer main thread busy during it',2),('backend work in it (RunTasks + DoPendingCommit)',3),('of which CommitPhaseTwo (the write to disk)',4)]:
    v=[r[i] for r in rows]
    print(f"{lab:55s} median {st.median(v):6.2f} ms  max {max(v):6.2f} ms")
# what the renderer main thread does during the commits: time by event name (events directly inside RunTask)
import collections
tot=collections.Counter()
mainkeys={k for k,v in names.items() if v=='CrRendererMain'}
mx=[e for e in ev if e.get('ph')=='X' and (e['pid'],e['tid']) in mainkeys and e.get('name') not in ('ThreadControllerImpl::RunTask','RunTask','BlinkScheduler_PerformMicrotaskCheckpoint','RunMicrotasks','SimpleWatcher::OnHandleReady','Receive mojo message')]
for (a,b) in commits:
    for e in mx:
        s=e['ts']; t=s+e.get('dur',0)
        o=max(0,min(t,b)-max(s,a))
        if o>0:
            label=e['name']
            if label=='EventDispatch': label+=':'+str(e.get('args',{}).get('data',{}).get('type'))
            if label=='FunctionCall': label+=':'+str(e.get('args',{}).get('data',{}).get('functionName',''))[:30]
            tot[label]+=o/1000
n=len(commits)
print('renderer main thread during the commit transactions, per commit (ms; nested events overlap):')
for k,v in tot.most_common(22): print(f"  {k:60s} {v/n:6.2f}")
# Replies held for the frame: the first IndexedDB reply the page's main thread took after the transaction started,
# against the first BeginMainFrame after the Enter (a reply within 0.5 ms after that frame's start counts as held)
replies=sorted(e['ts'] for e in ev if e.get('name')=='Receive mojo reply' and (e['pid'],e['tid']) in mainkeys and 'IDB' in json.dumps(e.get('args',{})))
frames=sorted(e['ts'] for e in main if e.get('args',{}).get('src_func')=='ScheduledActionSendBeginMainFrame')
held=0; lag=[]
for (a,b) in commits:
    k=max([t for t in kd if t<=a], default=a)
    r=min([t for t in replies if t>=a], default=None)
    f=min([t for t in frames if t>=k], default=None)
    if r is None: continue
    lag.append((r-a)/1000)
    if f is not None and f<=r: held+=1
print(f"first reply on the main thread after the transaction start: median {st.median(lag):.2f} ms, max {max(lag):.2f} ms")
print(f"commits whose first reply came only after the first frame after the Enter (held for it, or simply later): {held} of {len(lag)}")
