/** The reading screen with its one-window guard: the chunk App loads when reading starts (load-reading.ts). */
import type { Notice } from '../state/app-state';
import { ReadingScreen } from './ReadingScreen';
import { SingleWindowSession } from './SingleWindowSession';

type Props = { studyId: string; sessionId: string; notice: Notice | null; onHandBack: () => void };

export const ReadView = ({ studyId, sessionId, notice, onHandBack }: Props) => (
  <SingleWindowSession sessionId={sessionId} onHandBack={onHandBack}>
    <ReadingScreen studyId={studyId} sessionId={sessionId} notice={notice} />
  </SingleWindowSession>
);
