import { isReaderFlow } from '../../../src/ui/lock/reader-flow';
import type { Screen } from '../../../src/ui/state/app-state';

// Every screen the app has, typed so that a new screen name fails the typecheck until it is listed
// here: the list of what the coordinator lock guards cannot fall behind the app.
const screens: Record<Screen['name'], Screen> = {
  home: { name: 'home' },
  'new-study': { name: 'new-study' },
  study: { name: 'study', studyId: 's' },
  results: { name: 'results', studyId: 's' },
  read: { name: 'read', studyId: 's', sessionId: 'x' },
  handover: { name: 'handover', studyId: 's' },
  'edit-study': { name: 'edit-study', studyId: 's' },
  audit: { name: 'audit', studyId: 's' },
  'reader-report': { name: 'reader-report', studyId: 's', readerId: 'r' },
};

describe('the reader flow and the coordinator side', () => {
  it('keeps only the reading and handover screens outside the lock', () => {
    const open = Object.values(screens).filter(isReaderFlow).map((s) => s.name);
    expect(open.sort()).toEqual(['handover', 'read']);
  });
});
