const electron = vi.hoisted(() => ({ exposeInMainWorld: vi.fn(), invoke: vi.fn() }));
vi.mock('electron', () => ({
  contextBridge: { exposeInMainWorld: electron.exposeInMainWorld },
  ipcRenderer: { invoke: electron.invoke, send: vi.fn(), on: vi.fn() },
}));

import { CHANNELS } from '../../../electron/channels';
import { makeBridge } from '../../../electron/preload';

const exposed = () => {
  expect(electron.exposeInMainWorld).toHaveBeenCalledTimes(1);
  const [name, api] = electron.exposeInMainWorld.mock.calls[0] ?? [];
  expect(name).toBe('heedHost');
  return api as Record<string, unknown>;
};

describe('preload', () => {
  it('exports the bridge factory the module exposes', () => {
    expect(Object.keys(makeBridge(async () => null as never)).sort()).toEqual(Object.keys(exposed()).sort());
  });

  it('exposes exactly one method per channel, and never ipcRenderer', () => {
    const api = exposed();
    expect(Object.keys(api).sort()).toEqual(Object.keys(CHANNELS).sort());
    for (const value of Object.values(api)) expect(typeof value).toBe('function');
    expect(Object.values(api)).not.toContain(electron.invoke);
  });

  it.each(Object.entries(CHANNELS))('%s invokes %s with the payload and passes the answer back', async (key, channel) => {
    electron.invoke.mockResolvedValueOnce({ ok: true, value: key });
    const method = exposed()[key] as (payload: unknown) => Promise<unknown>;
    const payload = { probe: key };
    await expect(method(payload)).resolves.toEqual({ ok: true, value: key });
    expect(electron.invoke).toHaveBeenLastCalledWith(channel, payload);
  });
});
