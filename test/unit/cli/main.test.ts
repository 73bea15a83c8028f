import { spawnSync } from 'node:child_process';

// The real command under a shell pipe whose reader stops after 100 bytes: the JSON of this
// fixture is far larger than a pipe's buffer, so heed's write meets a closed pipe (EPIPE).
describe('heed piped into a reader that stops early', () => {
  it('exits 0 without a stack trace', () => {
    const script = 'node bin/heed.js analyze test/reference/fixtures/log-ties.csv --json --boot 0 | head -c 100 > /dev/null; echo "status=${PIPESTATUS[0]}"';
    const r = spawnSync('bash', ['-c', script], { encoding: 'utf8' });
    expect(r.stdout.trim()).toBe('status=0');
    expect(r.stderr).toBe('');
  });
  it('still prints the whole report when nobody stops reading', () => {
    const r = spawnSync(process.execPath, ['bin/heed.js', 'analyze', 'test/reference/fixtures/log-ties.csv', '--json', '--boot', '0'], { encoding: 'utf8' });
    expect(r.status).toBe(0);
    expect(r.stdout.length).toBeGreaterThan(65536);
    expect(Object.keys(JSON.parse(r.stdout))).toEqual(['readers', 'group']);
  });
});
