/** What the start screen shows, loaded in one go: its queries run side by side, not one after another. */
import { STATUS_WORDS } from '../../core/study-status';
import { listCaseSets } from '../../store/case-sets';
import type { HeedDb } from '../../store/db';
import { unfinishedSessions, type Unfinished } from '../../store/progress';
import type { StoredCaseSet, StoredStudy } from '../../store/records';
import { statusOfStudy } from '../../store/study-lifecycle';
import { storeIdentity } from '../../store/store-identity';
import { listStudies } from '../../store/studies';
import type { LostStore } from '../../store/records';
import { originStorage, rememberedStore, rememberStore } from '../services/store-loss';
import { DEMO_SET_ID, ensureDemoCaseSet } from '../services/demo-set';

export type HomeData = {
  caseSets: StoredCaseSet[]; studies: StoredStudy[]; unfinished: Unfinished[]; statuses: Map<string, string>;
  /** the browser lost an earlier database of this window, and the notice is not read yet */
  storeLoss: LostStore | null;
};

export const loadHome = async (db: HeedDb): Promise<HomeData> => {
  // the lists are asked for first: the first localStorage read of a page waits for the browser to
  // load it, and the database can work meanwhile
  const lists = Promise.all([listCaseSets(db), listStudies(db), unfinishedSessions(db)]);
  // the database this window used last, read before this one's identity is looked at or made
  const storage = originStorage();
  const remembered = storage === null ? null : rememberedStore(storage);
  const [[listed, studies, unfinished], identity] = await Promise.all([lists, storeIdentity(db, remembered)]);
  if (storage !== null) rememberStore(storage, identity);
  const storeLoss = identity.unreadLoss;
  // the demo set is generated once, on first launch; a relaunch only sees it in the list
  const caseSets = listed.some((s) => s.id === DEMO_SET_ID) ? listed : await ensureDemoCaseSet(db).then(() => listCaseSets(db));
  const statuses = new Map(await Promise.all(studies.map(async (s) => [s.id, STATUS_WORDS[await statusOfStudy(db, s)]] as const)));
  return { caseSets, studies, unfinished, statuses, storeLoss };
};
