import { applyCommit, applySkip, currentPosition, type SessionItem } from '../../../src/core/session';

const items: SessionItem[] = ['c1', 'c2', 'c3'].map((caseId, i) => ({ caseId, practice: false, assistance: 'sequential', order: i + 1, caution: false, breakBefore: false }));

describe('skipping a case that cannot be shown', () => {
  it('moves the position past every step of the skipped case, with no answer for it', () => {
    const plan = { items, findings: ['a', 'b'] };
    const first = currentPosition(plan, []);
    const skipped = applySkip(first, 'c1');
    expect(skipped).toEqual(['c1']);
    const next = currentPosition({ ...plan, skipped }, []);
    if (next.done) throw new Error('not done yet');
    expect(next.item.caseId).toBe('c2');
    expect(next.step).toEqual({ itemIndex: 1, finding: 'a', phase: 'initial' });
    // the next answer goes to c2, and the machine still refuses an answer for the skipped case
    expect(applyCommit(next, next.step, null, { call: 1, confidence: 50, ms: 1 }).caseId).toBe('c2');
    expect(() => applyCommit(next, { itemIndex: 0, finding: 'a', phase: 'initial' }, null, { call: 1, confidence: 50, ms: 1 })).toThrow(/not the current one/);
  });

  it('skips only the case on screen, and a session whose last case is skipped is done', () => {
    const plan = { items, findings: ['a'] };
    expect(() => applySkip(currentPosition(plan, []), 'c2')).toThrow(/only the case on screen/);
    const all = currentPosition({ ...plan, skipped: ['c1', 'c2', 'c3'] }, []);
    expect(all.done).toBe(true);
    expect(() => applySkip(all, 'c3')).toThrow(/complete/);
  });

  it('skips a case whose first calls were already committed (a later image failed)', () => {
    const plan = { items, findings: ['a'] };
    const answers = [{ caseId: 'c1', finding: 'a', initial: { call: 1 as const, confidence: 60, ms: 5 }, final: null }];
    const position = currentPosition(plan, answers);
    if (position.done) throw new Error('not done yet');
    expect(position.step.phase).toBe('final');
    const next = currentPosition({ ...plan, skipped: applySkip(position, 'c1') }, answers);
    expect(next.done ? null : next.item.caseId).toBe('c2');
  });
});
