import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { api, baseUrl, expectErrorShape, signUpShop } from '../support/http';
import { shopWithStandard } from '../support/shop';

const csvOf = async (cookie: string, what: string) => {
  const res = await fetch(`${baseUrl()}/api/export/${what}`, { headers: { cookie } });
  expect(res.status).toBe(200);
  expect(res.headers.get('content-type')).toMatch(/^text\/csv/);
  return res.text();
};
// Read as a spreadsheet would show the cells: the export's formula escape (a
// leading apostrophe, OWASP CSV Injection) taken off again; an id may start with "-".
const rowsOf = (csv: string) => Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true, transform: (v) => v.replace(/^'(?=[=+\-@\t\r])/, '') }).data;

describe('CSV out and in', () => {
  let a: string;
  beforeAll(async () => {
    a = (await signUpShop('CSV shop A')).cookie;
    const add = async (path: string, body: object) => expect((await api(path, { cookie: a, body })).status).toBe(201);
    await add('/api/colorants', { name: 'Base, firm', kind: 'base', unit: 'ml', costPerUnit: 0.011, stock: 3785.411784, lowStockAt: 1000 });
    await add('/api/colorants', { name: '=HYPERLINK("http://x.test")', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 300, notes: '+1 drop for thin molds', swatch: { l: 41.2, a: -12.5, b: 30 } });
    await add('/api/colorants', { name: 'Flake, gold "coarse"', kind: 'flake', unit: 'tsp', flakeSizeIn: 0.035, flakeColor: 'gold', notes: 'line one\nline two' });
    await add('/api/molds', { name: 'Craw 4 in', bodyStyle: 'craw', lengthIn: 4, cavities: 2, mlPerCavity: 12.5, thickness: 'thick' });
    await add('/api/molds', { name: '@finesse 6 cavity', bodyStyle: 'finesse worm', cavities: 6, mlPerCavity: 3.2, thickness: 'thin' });
  });

  it('escapes formula-looking cells on export (OWASP CSV Injection) and keeps negative numbers as numbers', async () => {
    const csv = await csvOf(a, 'colorants');
    expect(csv).toContain('"\'=HYPERLINK(""http://x.test"")"');
    expect(csv).toContain('"\'+1 drop for thin molds"');
    expect(csv).toContain(',-12.5,');
    expect(csv).not.toMatch(/(^|[\r\n,])=HYPERLINK/);
    expect(await csvOf(a, 'molds')).toContain('"\'@finesse 6 cavity"');
  });

  it('round trip: export, import into a new shop, export again gives the same rows', async () => {
    const b = (await signUpShop('CSV shop B')).cookie;
    for (const what of ['colorants', 'molds'] as const) {
      const first = await csvOf(a, what);
      const preview = await api(`/api/${what}/import`, { cookie: b, body: { csv: first } });
      expect(preview.status).toBe(200);
      expect(preview.body.errors).toEqual([]);
      expect(preview.body.written).toBe(0);
      expect((await api(`/api/${what}`, { cookie: b })).body).toHaveLength(0); // a preview writes nothing
      const done = await api(`/api/${what}/import`, { cookie: b, body: { csv: first, commit: true } });
      expect(done.status, JSON.stringify(done.body)).toBe(201);
      expect(done.body.written).toBe(rowsOf(first).length);
      const again = await csvOf(b, what);
      expect(rowsOf(again)).toEqual(rowsOf(first));
      expect(again).toBe(first);
    }
    // Stock came in through the ledger.
    const base = (await api('/api/colorants', { cookie: b })).body.find((c: any) => c.name === 'Base, firm');
    const stock = (await api(`/api/colorants/${base.id}/stock`, { cookie: b })).body;
    expect(stock.movements).toEqual([expect.objectContaining({ kind: 'adjustment', note: 'opening stock (CSV import)' })]);
    expect(stock.stock).toBeCloseTo(3785.411784, 9);
  });

  it('a file with one bad row writes nothing and names the row', async () => {
    const c = (await signUpShop('CSV shop C')).cookie;
    const csv = [
      'name,kind,unit,cost_per_unit,stock',
      'Pigment one,pigment,drops,0.02,100',
      'Pigment two,pigment,litres,0.02,100',
      'Pigment three,pigment,drops,lots,100',
      'pigment ONE,pigment,drops,,',
    ].join('\r\n');
    const res = await api('/api/colorants/import', { cookie: c, body: { csv, commit: true } });
    expect(res.status).toBe(422);
    const body = res.body;
    expectErrorShape(res.body);
    expect(body.error.message).toMatch(/^Nothing was imported: 3 rows/);
    expect(body.errors.map((e: any) => e.row)).toEqual([3, 4, 5]);
    expect(body.errors[0].message).toMatch(/^unit: unit must be one of/);
    expect(body.errors[1].message).toMatch(/cost per unit must be a number/);
    expect(body.errors[2].message).toMatch(/already on row 2/);
    expect((await api('/api/colorants', { cookie: c })).body).toHaveLength(0);
    const header = await api('/api/molds/import', { cookie: c, body: { csv: 'name,colour\r\nx,y', commit: true } });
    expect(header.status).toBe(422);
    expect(header.body.errors[0]).toMatchObject({ row: 1 });
    expect((await api('/api/molds/import', { cookie: c, body: { csv: 42 } })).status).toBe(400);
  });

  it('exports standards with their recipes and batches with ΔE00 and pass/fail', async () => {
    const s = await shopWithStandard();
    const logged = await s.logBatch({ cups: 2, baits: 30 });
    expect(logged.status).toBe(201);
    const standards = rowsOf(await csvOf(s.cookie, 'standards'));
    expect(standards.map((r) => [r.zone, r.colorant, r.amount_per_cup, r.unit])).toEqual([
      ['back', 'Pigment, moss', '6', 'drops'], ['back', 'Flake, black', '0.25', 'tsp'], ['belly', 'Pigment, moss', '2', 'drops'],
    ]);
    const batches = rowsOf(await csvOf(s.cookie, 'batches'));
    expect(batches).toHaveLength(2);
    for (const r of batches) {
      expect(r.batch_id).toBe(logged.body.id);
      expect(Number(r.de00)).toBeCloseTo(logged.body.zones.find((z: any) => z.name === r.zone).dE00, 2);
      expect(r.batch_pass).toBe(logged.body.pass ? 'pass' : 'fail');
      expect(r.zone_cups).toBe('back 1; belly 1');
    }
    expect((await api('/api/export/secrets', { cookie: s.cookie })).status).toBe(404);
    expect((await fetch(`${baseUrl()}/api/export/colorants`)).status).toBe(401);
  });
});
