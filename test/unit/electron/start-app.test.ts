const electron = vi.hoisted(() => {
  const listeners = new Map<string, (...args: unknown[]) => void>();
  let resolveReady: () => void = () => {};
  const ready = new Promise<void>((r) => { resolveReady = r; });
  return {
    listeners,
    fireReady: () => resolveReady(),
    app: {
      enableSandbox: vi.fn(),
      requestSingleInstanceLock: vi.fn(() => true),
      quit: vi.fn(),
      on: vi.fn((name: string, fn: (...args: unknown[]) => void) => { listeners.set(name, fn); }),
      whenReady: vi.fn(() => ready),
      commandLine: { appendSwitch: vi.fn() },
      isPackaged: false,
    },
    protocol: { registerSchemesAsPrivileged: vi.fn(), handle: vi.fn() },
    ipcMain: { handle: vi.fn() },
    session: { defaultSession: { tag: 'default' } },
  };
});
vi.mock('electron', () => ({ app: electron.app, protocol: electron.protocol, ipcMain: electron.ipcMain, session: electron.session }));
const window = vi.hoisted(() => ({
  applySessionPolicy: vi.fn(),
  guardContents: vi.fn(),
  createMainWindow: vi.fn(() => ({ isMinimized: () => false, restore: vi.fn(), focus: vi.fn() })),
}));
vi.mock('../../../electron/window', () => window);

import { CHANNELS } from '../../../electron/channels';
import { debugPortFrom, startApp } from '../../../electron/start-app';

describe('startApp', () => {
  it('registers heed:// as privileged before ready, then wires policy, scheme, IPC and the window', async () => {
    startApp({ distRoot: '/app/dist', preload: '/app/dist-electron/preload.cjs' }, { HEED_DEBUG_PORT: '9444' });
    expect(electron.protocol.registerSchemesAsPrivileged).toHaveBeenCalledWith([
      { scheme: 'heed', privileges: expect.objectContaining({ standard: true, secure: true }) },
    ]);
    expect(electron.app.enableSandbox).toHaveBeenCalled();
    expect(electron.app.commandLine.appendSwitch).toHaveBeenCalledWith('remote-debugging-port', '9444');
    // Nothing that needs the app ready has run yet.
    expect(electron.protocol.handle).not.toHaveBeenCalled();
    expect(window.createMainWindow).not.toHaveBeenCalled();

    // Every web contents gets the shared guards.
    const contents = { id: 1 };
    electron.listeners.get('web-contents-created')?.({}, contents);
    expect(window.guardContents).toHaveBeenCalledWith(contents);

    electron.fireReady();
    await vi.waitFor(() => expect(window.createMainWindow).toHaveBeenCalledWith('/app/dist-electron/preload.cjs', false));
    expect(window.applySessionPolicy).toHaveBeenCalledWith(electron.session.defaultSession);
    expect(electron.protocol.handle).toHaveBeenCalledWith('heed', expect.any(Function));
    expect(electron.ipcMain.handle.mock.calls.map((c) => c[0]).sort()).toEqual(Object.values(CHANNELS).sort());
    expect(electron.listeners.has('window-all-closed')).toBe(true);
  });

  it('quits without a window when another Heed already runs', () => {
    vi.clearAllMocks();
    electron.app.requestSingleInstanceLock.mockReturnValueOnce(false);
    startApp({ distRoot: '/d', preload: '/p' }, {});
    expect(electron.app.quit).toHaveBeenCalled();
    expect(electron.app.commandLine.appendSwitch).not.toHaveBeenCalled();
    expect(electron.app.on).not.toHaveBeenCalled();
  });
});

describe('debugPortFrom', () => {
  it('takes a valid port only', () => {
    expect(debugPortFrom('9222')).toBe(9222);
    expect(debugPortFrom(undefined)).toBeNull();
    expect(debugPortFrom('')).toBeNull();
    expect(debugPortFrom('0')).toBeNull();
    expect(debugPortFrom('70000')).toBeNull();
    expect(debugPortFrom('92x')).toBeNull();
  });
});
