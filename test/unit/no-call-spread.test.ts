// No array is spread into a function call anywhere in src/ (`push(...xs)`, `Math.max(...xs)`,
// `String.fromCharCode(...xs)`, `new Set(...)` arguments): each spread element becomes one stack
// slot, so a large array throws "Maximum call stack size exceeded" (seen at 130,000+ reads).
// oxlint 1.95 has no rule for this (`npx oxlint --rules`: prefer-spread and no-useless-spread
// push the other way), so this test walks every source file's syntax tree (oxc's parser, as
// shipped in rolldown, which Vite 8 uses; TypeScript 7 has no JavaScript API) and fails on a
// spread element that is a call or `new` argument. Spreads into array and object literals are
// fine (no stack slots).
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { parseAst } from 'rolldown/parseAst';

const ROOT = join(import.meta.dirname, '..', '..');

// Spreads of fixed-length tuples, checked by hand: `${file}: ${source text of the call}`.
const FIXED_ARITY = new Set(['src/ui/reading/ReadingScreen.tsx: logSessionMoment(...args)']);

const sourceFiles = (dir: string): string[] =>
  readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile() && /\.(ts|tsx)$/.test(e.name))
    .map((e) => join(e.parentPath, e.name));

type Node = { type?: unknown; start?: number; arguments?: unknown[]; [key: string]: unknown };
const isNode = (v: unknown): v is Node => typeof v === 'object' && v !== null;

/** Every `file: call text` with a spread argument in the given file's text. */
export const callSpreads = (file: string, text: string): string[] => {
  const program: unknown = parseAst(text, { lang: file.endsWith('x') ? 'tsx' : 'ts' }, file);
  const found: string[] = [];
  const stack: unknown[] = [program];
  while (stack.length > 0) {
    const node = stack.pop();
    if (Array.isArray(node)) {
      for (const child of node) stack.push(child);
      continue;
    }
    if (!isNode(node)) continue;
    if ((node.type === 'CallExpression' || node.type === 'NewExpression') && Array.isArray(node.arguments)
      && node.arguments.some((a) => isNode(a) && a.type === 'SpreadElement')) {
      const end = typeof node.end === 'number' ? node.end : text.length;
      found.push(`${file}: ${text.slice(node.start ?? 0, end).split('\n')[0]}`);
    }
    for (const value of Object.values(node)) if (typeof value === 'object' && value !== null) stack.push(value);
  }
  return found.sort();
};

describe('no spread of arrays into calls', () => {
  it('finds a spread into push, Math.max and new (the check can fail)', () => {
    const hits = callSpreads('x.ts', 'a.push(...b); Math.max(1, ...c); new Set(...d); const e = [...b]; f({ ...g });');
    expect(hits).toEqual(['x.ts: Math.max(1, ...c)', 'x.ts: a.push(...b)', 'x.ts: new Set(...d)']);
  });

  it('src/ has none', () => {
    const hits: string[] = [];
    for (const path of sourceFiles(join(ROOT, 'src'))) {
      const file = relative(ROOT, path).split('\\').join('/');
      for (const hit of callSpreads(file, readFileSync(path, 'utf8'))) if (!FIXED_ARITY.has(hit)) hits.push(hit);
    }
    expect(hits).toEqual([]);
  });
});
