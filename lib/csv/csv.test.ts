import { describe, expect, it } from 'vitest';
import { parseCsv, toCsv } from './csv';

// OWASP, "CSV Injection": cells beginning with =, +, -, @, tab or carriage
// return may run as formulas in a spreadsheet; prefix them with an apostrophe.
describe('CSV through papaparse', () => {
  it('escapes formula-looking text cells and leaves numbers as numbers', () => {
    const csv = toCsv(['name', 'a'], [
      { name: '=HYPERLINK("http://x.test")', a: -12.5 },
      { name: '+1 drop', a: 3 },
      { name: '-thin', a: null },
      { name: '@import', a: 0 },
      { name: 'Pigment, moss', a: 1 },
    ]);
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe('name,a');
    expect(lines[1]).toBe('"\'=HYPERLINK(""http://x.test"")",-12.5');
    expect(lines[2]).toBe('"\'+1 drop",3');
    expect(lines[3]).toBe('"\'-thin",');
    expect(lines[4]).toBe('"\'@import",0');
    expect(lines[5]).toBe('"Pigment, moss",1');
  });

  it('reads back what it wrote, escape undone, headers lower-cased and trimmed', () => {
    const csv = toCsv(['name', 'notes'], [{ name: '=1+1', notes: 'a "quoted", line' }, { name: 'plain', notes: null }]);
    const { fields, rows, errors } = parseCsv(`\uFEFF${csv.replace('name,notes', ' Name , NOTES ')}\r\n\r\n`);
    expect(errors).toEqual([]);
    expect(fields).toEqual(['name', 'notes']);
    expect(rows).toEqual([{ name: '=1+1', notes: 'a "quoted", line' }, { name: 'plain', notes: '' }]);
  });
});
