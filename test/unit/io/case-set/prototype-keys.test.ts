// Attribute columns named like Object.prototype's properties stay ordinary attributes: a
// case___proto__ column was silently turned into "[object Object]".
import { readWith } from './fixtures';

const csv = [
  'case_id,finding,truth,image,case___proto__,case_constructor,case_toString',
  'C1,target,1,img/c1.png,North,Halden,a',
  'C2,target,0,img/c2.jpg,South,Korvik,b',
].join('\n');

describe('case attributes named like prototype properties', () => {
  it('keeps case___proto__, case_constructor and case_toString as plain values', async () => {
    const result = await readWith(`${csv}\n`);
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.manifest.attributeNames).toEqual(['__proto__', 'constructor', 'toString']);
    const [first, second] = result.manifest.cases;
    expect(Object.getOwnPropertyDescriptor(first?.attributes, '__proto__')?.value).toBe('North');
    expect(second?.attributes.constructor).toBe('Korvik');
    expect(second?.attributes.toString).toBe('b');
    const proto = result.summary.subgroups.find((s) => s.attribute === '__proto__');
    expect(proto?.values.map((v) => [v.value, v.cases])).toEqual([['North', 1], ['South', 1]]);
  });

  it('still finds a case whose rows disagree on case___proto__', async () => {
    const rows = `${csv}\nC1,mass,0,img/c1.png,South,Halden,a\n`;
    const result = await readWith(rows);
    if (result.ok) throw new Error('expected a refusal');
    expect(result.problems[0]).toMatchObject({ row: 4, column: 'case___proto__' });
    expect(result.problems[0]?.message).toBe('case C1 has case___proto__ "South" here but "North" on line 2');
  });
});
