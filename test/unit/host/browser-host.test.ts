import type { AnchorLike, BrowserDeps, FileInputLike, FileLike } from '../../../src/host/browser-host';
import { createBrowserHost } from '../../../src/host/browser-host';

const fakeFile = (webkitRelativePath: string, text: string, name = webkitRelativePath.split('/').at(-1) ?? ''): FileLike => ({
  name,
  webkitRelativePath,
  arrayBuffer: async () => new TextEncoder().encode(text).buffer,
});

const fakeDeps = () => {
  const anchors: (AnchorLike & { clicks: number })[] = [];
  const inputs: (FileInputLike & { fire(type: 'change' | 'cancel'): void })[] = [];
  const blobs = new Map<string, Blob>();
  const revoked: string[] = [];
  const timers: { run: () => void; ms: number }[] = [];
  const titles: string[] = [];
  let title = 'Heed';
  let printedUnder: string | null = null;
  const deps: BrowserDeps = {
    makeAnchor: () => {
      const a = { href: '', download: '', rel: '', clicks: 0, click() { this.clicks += 1; } };
      anchors.push(a);
      return a;
    },
    makeFileInput: () => {
      const listeners = new Map<string, () => void>();
      const input = {
        type: '', accept: '', multiple: false, webkitdirectory: false, files: null as FileLike[] | null,
        addEventListener: (type: 'change' | 'cancel', fn: () => void) => { listeners.set(type, fn); },
        click: vi.fn(),
        fire: (type: 'change' | 'cancel') => listeners.get(type)?.(),
      };
      inputs.push(input);
      return input;
    },
    createObjectURL: (blob) => {
      const url = `blob:heed/${blobs.size}`;
      blobs.set(url, blob);
      return url;
    },
    revokeObjectURL: (url) => { revoked.push(url); },
    print: () => { printedUnder = title; },
    getTitle: () => title,
    setTitle: (t) => { title = t; titles.push(t); },
    later: (run, ms) => { timers.push({ run, ms }); },
  };
  return { deps, anchors, inputs, blobs, revoked, timers, titles, printed: () => printedUnder, title: () => title };
};

describe('browser saveFile', () => {
  it('downloads the data through a blob URL with the suggested name, then frees it', async () => {
    const f = fakeDeps();
    const result = await createBrowserHost(f.deps).saveFile('reads.csv', 'a,b\n1,2\n', 'text/csv');
    expect(result).toEqual({ saved: true, handedTo: 'downloads' });
    const a = f.anchors[0];
    expect(a).toMatchObject({ download: 'reads.csv', href: 'blob:heed/0', clicks: 1 });
    const blob = f.blobs.get('blob:heed/0');
    expect(blob?.type).toBe('text/csv');
    expect(await blob?.text()).toBe('a,b\n1,2\n');
    expect(f.revoked).toEqual([]);
    f.timers[0]?.run();
    expect(f.revoked).toEqual(['blob:heed/0']);
  });

  it('keeps bytes exact, even from a view into a larger buffer', async () => {
    const f = fakeDeps();
    const backing = new Uint8Array([9, 1, 2, 3, 9]);
    await createBrowserHost(f.deps).saveFile('b.zip', backing.subarray(1, 4), 'application/zip');
    const blob = f.blobs.get('blob:heed/0');
    expect([...new Uint8Array(await (blob ?? new Blob()).arrayBuffer())]).toEqual([1, 2, 3]);
  });

  it('refuses a path as a name, without downloading', async () => {
    const f = fakeDeps();
    await expect(createBrowserHost(f.deps).saveFile('../x.csv', 'x', 'text/csv')).rejects.toThrow(/folder separator/);
    expect(f.anchors).toHaveLength(0);
  });
});

describe('browser printToPdf', () => {
  it('opens the print dialog under the suggested name and restores the title', async () => {
    const f = fakeDeps();
    const result = await createBrowserHost(f.deps).printToPdf('feedback R1.pdf');
    expect(result).toEqual({ saved: false, handedTo: 'print-dialog' });
    expect(f.printed()).toBe('feedback R1');
    expect(f.title()).toBe('Heed');
  });
});

describe('browser pickCaseSet', () => {
  it('picks a folder: paths relative to the chosen folder, label its name', async () => {
    const f = fakeDeps();
    const picking = createBrowserHost(f.deps).pickCaseSet();
    const input = f.inputs[0];
    if (!input) throw new Error('no input made');
    expect(input).toMatchObject({ type: 'file', webkitdirectory: true, multiple: true });
    expect(input.click).toHaveBeenCalled();
    input.files = [fakeFile('vesper/cases.csv', 'case_id'), fakeFile('vesper/images/a.png', 'PNG')];
    input.fire('change');
    const set = await picking;
    expect(set?.label).toBe('vesper');
    expect(set?.files.map((x) => x.path)).toEqual(['cases.csv', 'images/a.png']);
    expect(new TextDecoder().decode(await set?.files[1]?.read())).toBe('PNG');
  });

  it('picks a zip as a single entry named *.zip', async () => {
    const f = fakeDeps();
    const picking = createBrowserHost(f.deps).pickCaseSet('zip');
    const input = f.inputs[0];
    if (!input) throw new Error('no input made');
    expect(input).toMatchObject({ webkitdirectory: false, multiple: false, accept: '.zip,application/zip' });
    input.files = [fakeFile('', 'PK', 'Vesper Set.ZIP')];
    input.fire('change');
    const set = await picking;
    expect(set).toMatchObject({ label: 'Vesper Set', files: [{ path: 'Vesper Set.ZIP' }] });
  });

  it('refuses a picked file that is not a .zip, naming it', async () => {
    const f = fakeDeps();
    const picking = createBrowserHost(f.deps).pickCaseSet('zip');
    const input = f.inputs[0];
    if (!input) throw new Error('no input made');
    input.files = [fakeFile('', 'x', 'cases.csv')];
    input.fire('change');
    await expect(picking).rejects.toThrow('"cases.csv" is not a .zip file; pick a folder or a .zip of one');
  });

  it('returns null on cancel, and on an empty pick', async () => {
    const f = fakeDeps();
    const host = createBrowserHost(f.deps);
    const first = host.pickCaseSet();
    f.inputs[0]?.fire('cancel');
    expect(await first).toBeNull();
    const second = host.pickCaseSet();
    const input = f.inputs[1];
    if (!input) throw new Error('no input made');
    input.files = [];
    input.fire('change');
    expect(await second).toBeNull();
  });
});
