// datapackage.json of a study bundle against the published Frictionless JSON Schemas
// (test/reference/published/frictionless/README.md: Data Package, Tabular Data Resource and
// Table Schema profiles from datapackage@1.1.10 and tableschema@1.12.6), validated with Ajv 8.20.0.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import Ajv from 'ajv';
import { unzipSync } from 'fflate';
import Papa from 'papaparse';
import { sha256Hex } from '../../src/core/chain';
import { generateDemoCaseSet } from '../../demo-cases/generator/generate';
import { simulateStudy } from '../../src/io/bundle/simulate-study';
import { writeBundle } from '../../src/io/bundle/write';

const dir = join(import.meta.dirname, 'published', 'frictionless');
// The profiles declare draft-04; Ajv 8 reads them as the later drafts, which agree on every
// keyword they use. Formats (uri, email) are not checked: none of our values uses them.
const profile = (name: string): object => {
  const { $schema: _draft, ...schema } = JSON.parse(readFileSync(join(dir, name), 'utf8')) as Record<string, unknown>;
  return schema;
};
const ajv = new Ajv({ strict: false, allErrors: true, validateFormats: false });
const dataPackage = ajv.compile(profile('data-package.json'));
const tabularResource = ajv.compile(profile('tabular-data-resource.json'));
const tableSchema = ajv.compile(profile('table-schema.json'));

type Field = { name: string; type: string; trueValues?: string[]; falseValues?: string[]; constraints?: { required?: boolean; enum?: string[] } };
type Resource = { name: string; path: string; profile: string; schema?: { fields: Field[]; missingValues: string[] } };

describe('datapackage.json of a study bundle', () => {
  const demo = generateDemoCaseSet({ cases: 8 });
  const snapshot = simulateStudy(
    { name: demo.manifest.name, manifest: demo.manifest, imageSha256: new Map(demo.images.map((i) => [i.path, sha256Hex(i.bytes)])), images: null },
    { readers: 2, seed: 3, assistance: 'sequential' },
  );
  const files = unzipSync(writeBundle(snapshot));
  const text = (path: string) => new TextDecoder().decode(files[path]);
  const descriptor = JSON.parse(text('datapackage.json')) as { resources: Resource[] };

  it('is a valid Data Package whose tables are valid Tabular Data Resources with valid Table Schemas', () => {
    expect(dataPackage(descriptor), JSON.stringify(dataPackage.errors)).toBe(true);
    const tables = descriptor.resources.filter((r) => r.profile === 'tabular-data-resource');
    expect(tables.map((r) => r.path).sort()).toEqual(['cases.csv', 'reads.csv']);
    for (const r of tables) {
      expect(tabularResource(r), `${r.name}: ${JSON.stringify(tabularResource.errors)}`).toBe(true);
      expect(tableSchema(r.schema), `${r.name}: ${JSON.stringify(tableSchema.errors)}`).toBe(true);
    }
  });

  it('describes every column of each table, in order, and the values fit the declared types', () => {
    for (const r of descriptor.resources.filter((x) => x.schema)) {
      const rows = Papa.parse<string[]>(text(r.path), { skipEmptyLines: true }).data;
      const fields = r.schema?.fields ?? [];
      expect(rows[0]).toEqual(fields.map((f) => f.name));
      for (const row of rows.slice(1)) {
        fields.forEach((f, i) => {
          const v = row[i] ?? '';
          if (v === '') { expect(f.constraints?.required, `${r.path} ${f.name} empty`).not.toBe(true); return; }
          if (f.type === 'boolean') expect([...(f.trueValues ?? []), ...(f.falseValues ?? [])]).toContain(v);
          if (f.type === 'integer') expect(v).toMatch(/^-?\d+$/);
          if (f.type === 'number') expect(Number.isFinite(Number(v))).toBe(true);
          if (f.type === 'datetime') expect(Number.isNaN(Date.parse(v))).toBe(false);
          if (f.constraints?.enum) expect(f.constraints.enum).toContain(v);
        });
      }
    }
  });

  it('the validator refuses a broken descriptor (so the checks above can fail)', () => {
    expect(dataPackage({ ...descriptor, name: 'Upper Case Name' })).toBe(false);
    expect(tableSchema({ fields: [{ name: 'x', type: 'not-a-type' }] })).toBe(false);
  });
});
