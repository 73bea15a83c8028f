import { createContext, useContext, type ReactNode } from 'react';
import type { HeedDb } from '../store/db';

const DbContext = createContext<HeedDb | null>(null);

export const DbProvider = ({ db, children }: { db: HeedDb; children: ReactNode }) => (
  <DbContext.Provider value={db}>{children}</DbContext.Provider>
);

export const useDb = (): HeedDb => {
  const db = useContext(DbContext);
  if (!db) throw new Error('useDb outside DbProvider');
  return db;
};
