import { actions, getAppState, NOTICE_MS } from '../../../src/ui/state/app-state';

describe('notices', () => {
  afterEach(() => { vi.useRealTimers(); actions.goHome(); });

  it('an info notice fades by itself after a few seconds; a newer one gets its own time', () => {
    vi.useFakeTimers();
    actions.notify({ kind: 'info', text: 'Study created.' });
    vi.advanceTimersByTime(NOTICE_MS - 1000);
    actions.notify({ kind: 'info', text: 'Reader enrolled.' });
    vi.advanceTimersByTime(1500);
    expect(getAppState().notice?.text).toBe('Reader enrolled.');
    vi.advanceTimersByTime(NOTICE_MS);
    expect(getAppState().notice).toBeNull();
    expect(NOTICE_MS).toBeLessThanOrEqual(10_000);
  });

  it('an error notice stays until dismissed', () => {
    vi.useFakeTimers();
    actions.notify({ kind: 'error', text: 'Not saved.' });
    vi.advanceTimersByTime(10 * NOTICE_MS);
    expect(getAppState().notice?.text).toBe('Not saved.');
    actions.clearNotice();
    expect(getAppState().notice).toBeNull();
  });
});
