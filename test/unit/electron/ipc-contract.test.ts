import { CHANNELS, CHANNEL_KEYS, REQUESTS, describeIssues, saveFileRequest } from '../../../electron/ipc-contract';

describe('the IPC contract', () => {
  it('has one distinct heed: channel and one schema per key', () => {
    const names = Object.values(CHANNELS);
    expect(new Set(names).size).toBe(names.length);
    for (const name of names) expect(name).toMatch(/^heed:[a-z-]+$/);
    expect(Object.keys(REQUESTS).sort()).toEqual(Object.keys(CHANNELS).sort());
    expect([...CHANNEL_KEYS].sort()).toEqual(Object.keys(CHANNELS).sort());
  });

  it('accepts well-formed payloads', () => {
    expect(REQUESTS.saveFile.safeParse({ suggestedName: 'reads.csv', data: 'a', mime: 'text/csv; charset=utf-8' }).success).toBe(true);
    expect(REQUESTS.saveFile.safeParse({ suggestedName: 'bundle.zip', data: new Uint8Array(3), mime: 'application/zip' }).success).toBe(true);
    expect(REQUESTS.printToPdf.safeParse({ suggestedName: 'feedback R1.pdf' }).success).toBe(true);
    expect(REQUESTS.pickCaseSet.safeParse({ kind: 'zip' }).success).toBe(true);
    expect(REQUESTS.readCaseFile.safeParse({ token: crypto.randomUUID(), path: 'images/a.png', offset: 0 }).success).toBe(true);
    expect(REQUESTS.openFolder.safeParse({ where: '/home/r/Documents/reads.csv' }).success).toBe(true);
  });

  it('describes problems by field', () => {
    const parsed = saveFileRequest.safeParse({ suggestedName: '', data: 'x', mime: 'csv' });
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    const text = describeIssues(parsed.error);
    expect(text).toContain('suggestedName: the suggested file name is empty');
    expect(text).toContain('mime: mime is not a media type such as text/csv');
  });
});
