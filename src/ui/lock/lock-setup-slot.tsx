/**
 * Where the start page shows the coordinator-lock prompt: the gate decides whether it is due and
 * hands the prompt down; the start page places it below its title and caution, not above them.
 */
import { createContext, useContext, type ReactNode } from 'react';

export const LockSetupContext = createContext<ReactNode>(null);

export const LockSetupSlot = () => <>{useContext(LockSetupContext)}</>;
