import { calibration } from '../../../src/analysis/calibration';

describe('calibration', () => {
  it('bins [0,0.1) ... [0.9,1.0] and weights the gaps by bin size', () => {
    const c = calibration([0.05, 0.95, 0.1, 1.0, 0.15], [0, 1, 1, 1, 0]);
    expect(c.bins).toHaveLength(10);
    expect(c.bins[0]).toMatchObject({ n: 1, mean_predicted: 0.05, observed: 0 });
    // 0.1 opens bin 1 (left-closed), 1.0 stays in the last bin (closed on both sides)
    expect(c.bins[1]).toMatchObject({ n: 2, observed: 0.5 });
    expect(c.bins[9]).toMatchObject({ n: 2, observed: 1 });
    const ece = (1 * 0.05 + 2 * Math.abs(0.125 - 0.5) + 2 * Math.abs(0.975 - 1)) / 5;
    expect(c.ece).toBeCloseTo(ece, 12);
  });
  it('gives null ECE for n = 0 and refuses a forecast outside [0,1]', () => {
    expect(calibration([], []).ece).toBeNull();
    expect(() => calibration([1.2], [1])).toThrow(/forecast 0 is outside/);
  });
});
