// The one seam where Heed picks its platform: the Electron preload's bridge when present
// (window.heedHost), else the browser implementation. The UI calls getHost() and nothing else.
import { isBridge } from './bridge';
import { createBrowserHost } from './browser-host';
import { createElectronHost } from './electron-host';
import type { Host } from './types';

export type { CaseSetKind, Host, PickedCaseSet, PickedFile, SaveResult } from './types';

/** Chooses the host for a global scope; `makeBrowserHost` is replaceable for tests. */
export const chooseHost = (scope: object, makeBrowserHost: () => Host = () => createBrowserHost()): Host => {
  const bridge: unknown = Reflect.get(scope, 'heedHost');
  return isBridge(bridge) ? createElectronHost(bridge) : makeBrowserHost();
};

let current: Host | null = null;

/** The host of this window, chosen once. */
export const getHost = (): Host => {
  current ??= chooseHost(globalThis);
  return current;
};
