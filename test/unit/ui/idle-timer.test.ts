import { createIdleTimer } from '../../../src/ui/lock/idle-timer';

describe('the idle timer of the coordinator side', () => {
  afterEach(() => { vi.useRealTimers(); });
  it('fires once after the idle time, and activity restarts the wait', () => {
    vi.useFakeTimers();
    const onIdle = vi.fn();
    const timer = createIdleTimer(15 * 60_000, onIdle);
    vi.advanceTimersByTime(14 * 60_000);
    timer.touch();
    vi.advanceTimersByTime(14 * 60_000);
    expect(onIdle).not.toHaveBeenCalled();
    vi.advanceTimersByTime(60_000);
    expect(onIdle).toHaveBeenCalledTimes(1);
    vi.advanceTimersByTime(60 * 60_000);
    expect(onIdle).toHaveBeenCalledTimes(1);
    timer.stop();
  });
});
