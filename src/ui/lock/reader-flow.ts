/**
 * Which screens belong to the reader's flow. Every other screen is the coordinator's side, and is
 * behind the coordinator lock once a passphrase is set and a reading session has been opened.
 */
import type { Screen } from '../state/app-state';

const READER_FLOW: ReadonlySet<Screen['name']> = new Set(['read', 'handover']);

export const isReaderFlow = (screen: Screen): boolean => READER_FLOW.has(screen.name);
