import {
  answerProblem, applyCommit, currentPosition, planSteps, positionAt, stepCount, stepIndexOf, suggestionVisible,
  type CommittedAnswer, type SessionItem, type SessionPlan,
} from '../../../src/core/session';
import { elapsedMs, pauseClock, resumeClock, startClock } from '../../../src/core/active-clock';
import type { Assistance } from '../../../src/core/design';

const items = (assistance: Assistance, n: number): SessionItem[] =>
  Array.from({ length: n }, (_, i) => ({ caseId: `c${i + 1}`, practice: i === 0, assistance, order: i + 1, caution: false, breakBefore: false }));

/** Commits every step in turn through the machine, as the reading view does. */
const commitAll = (plan: SessionPlan, upTo: number): CommittedAnswer[] => {
  const answers = new Map<string, CommittedAnswer>();
  for (let i = 0; i < upTo; i++) {
    const position = currentPosition(plan, [...answers.values()]);
    if (position.done) break;
    const key = `${position.item.caseId}/${position.step.finding}`;
    answers.set(key, applyCommit(position, position.step, answers.get(key) ?? null, { call: (i % 2) as 0 | 1, confidence: 70, ms: 1000 + i }));
  }
  return [...answers.values()];
};

describe('session state machine', () => {
  it('asks one final step per case and finding when unaided or concurrent', () => {
    for (const mode of ['none', 'concurrent'] as const) {
      const plan = { items: items(mode, 3), findings: ['a', 'b'] };
      expect(planSteps(plan).map((s) => `${s.itemIndex}${s.finding}${s.phase[0]}`)).toEqual(['0af', '0bf', '1af', '1bf', '2af', '2bf']);
    }
  });

  it('asks initial then final per finding in sequential mode, revealing the suggestion only for the final call', () => {
    const plan = { items: items('sequential', 2), findings: ['a'] };
    expect(planSteps(plan).map((s) => s.phase)).toEqual(['initial', 'final', 'initial', 'final']);
    const two = { items: items('sequential', 1), findings: ['a', 'b'] };
    expect(planSteps(two).map((s) => `${s.finding}${s.phase[0]}`)).toEqual(['ai', 'bi', 'af', 'bf']);
    expect(suggestionVisible('sequential', 'initial')).toBe(false);
    expect(suggestionVisible('sequential', 'final')).toBe(true);
    expect(suggestionVisible('concurrent', 'final')).toBe(true);
    expect(suggestionVisible('none', 'final')).toBe(false);
  });

  it('resumes at the first unanswered step, including between an initial and a final call', () => {
    const plan = { items: items('sequential', 3), findings: ['a'] };
    const answers = commitAll(plan, 3); // c1 initial+final, c2 initial
    const position = currentPosition(plan, answers);
    expect(position.done).toBe(false);
    if (position.done) return;
    expect(position.item.caseId).toBe('c2');
    expect(position.step.phase).toBe('final');
    expect(position.caseNumber).toBe(2);
    // the locked initial answer is kept when the final one is added
    const merged = applyCommit(position, position.step, answers.find((a) => a.caseId === 'c2') ?? null, { call: 1, confidence: 90, ms: 5 });
    expect(merged.initial).toEqual({ call: 0, confidence: 70, ms: 1002 });
    expect(merged.final?.call).toBe(1);
  });

  it('is done after the last step and refuses further commits', () => {
    const plan = { items: items('concurrent', 2), findings: ['a'] };
    const answers = commitAll(plan, 10);
    const position = currentPosition(plan, answers);
    expect(position.done).toBe(true);
    expect(() => applyCommit(position, { itemIndex: 0, finding: 'a', phase: 'final' }, null, { call: 1, confidence: 1, ms: 1 })).toThrow(/complete/);
  });

  it('has no way back: a commit for an earlier step is refused', () => {
    const plan = { items: items('none', 3), findings: ['a'] };
    const answers = commitAll(plan, 2);
    const position = currentPosition(plan, answers);
    expect(() => applyCommit(position, { itemIndex: 0, finding: 'a', phase: 'final' }, answers[0] ?? null, { call: 1, confidence: 1, ms: 1 }))
      .toThrow(/not the current one/);
  });

  it('refuses a log with an answer beyond a gap', () => {
    const plan = { items: items('none', 3), findings: ['a'] };
    const gap: CommittedAnswer[] = [{ caseId: 'c2', finding: 'a', initial: null, final: { call: 1, confidence: 50, ms: 1 } }];
    expect(() => currentPosition(plan, gap)).toThrow(/after an unanswered step/);
  });

  it('finds a step by index without walking the answers, as currentPosition does after the same commits', () => {
    // a mixed plan: unaided, sequential and concurrent cases, two findings
    const mixed = [...items('none', 2), ...items('sequential', 3), ...items('concurrent', 2)].map((item, i) => ({ ...item, caseId: `m${i}` }));
    for (const plan of [{ items: mixed, findings: ['a', 'b'] }, { items: items('sequential', 4), findings: ['a'] }]) {
      const steps = planSteps(plan);
      expect(stepCount(plan)).toBe(steps.length);
      steps.forEach((step, index) => {
        expect(stepIndexOf(plan, step)).toBe(index);
        expect(positionAt(plan, index)).toEqual(currentPosition(plan, commitAll(plan, index)));
      });
      expect(positionAt(plan, steps.length)).toEqual(currentPosition(plan, commitAll(plan, steps.length)));
    }
    const plan = { items: items('none', 2), findings: ['a'] };
    expect(stepIndexOf(plan, { itemIndex: 0, finding: 'a', phase: 'initial' })).toBe(-1);
    expect(stepIndexOf(plan, { itemIndex: 0, finding: 'z', phase: 'final' })).toBe(-1);
    expect(stepIndexOf(plan, { itemIndex: 5, finding: 'a', phase: 'final' })).toBe(-1);
  });

  it('needs a call, and a confidence when the study asks for one', () => {
    expect(answerProblem({ call: null, confidence: 50 }, true)).toMatch(/present or absent/);
    expect(answerProblem({ call: 1, confidence: null }, true)).toMatch(/confidence/);
    expect(answerProblem({ call: 1, confidence: null }, false)).toBeNull();
    expect(answerProblem({ call: 0, confidence: 100 }, true)).toBeNull();
  });
});

describe('active clock', () => {
  it('excludes paused time', () => {
    let clock = startClock(1000);
    clock = pauseClock(clock, 1500);
    expect(elapsedMs(clock, 9000)).toBe(500);
    clock = resumeClock(clock, 9000);
    expect(elapsedMs(clock, 9250.04)).toBe(750);
    expect(pauseClock(pauseClock(clock, 9300), 9999).accumulated).toBe(800);
  });
});
