import { unzipSync } from 'fflate';
import { createHash } from 'node:crypto';
import { readBundle } from '../../../../src/io/bundle/read';
import { writeBundle, writeBundleAsync } from '../../../../src/io/bundle/write';
import { gatherStudySnapshot } from '../../../../src/store/bundle';
import { freshDb, readTinyStudy } from '../../support/bundle-study';

describe('writing a bundle with WebCrypto file hashes (the app\'s save and backups)', () => {
  it('gives the very bytes writeBundle gives, with and without images, and with no WebCrypto', async () => {
    const db = freshDb();
    const { study } = await readTinyStudy(db);
    for (const withImages of [false, true]) {
      const snapshot = await gatherStudySnapshot(db, study.id, withImages);
      const bytes = await writeBundleAsync(snapshot);
      expect(bytes).toEqual(writeBundle(snapshot));
      expect(readBundle(bytes).ok).toBe(true);
      // each manifest entry is the file's SHA-256 as Node's own crypto computes it
      const files = unzipSync(bytes);
      const manifest = JSON.parse(new TextDecoder().decode(files['manifest.json'])) as { files: { path: string; sha256: string }[] };
      expect(manifest.files.length).toBeGreaterThan(withImages ? 6 : 5);
      for (const f of manifest.files) expect(f.sha256).toBe(createHash('sha256').update(files[f.path]!).digest('hex'));
    }
    const snapshot = await gatherStudySnapshot(db, study.id);
    vi.stubGlobal('crypto', undefined);
    try {
      expect(await writeBundleAsync(snapshot)).toEqual(writeBundle(snapshot));
    } finally {
      vi.unstubAllGlobals();
    }
  });
});
