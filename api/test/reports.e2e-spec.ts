/**
 * Units in what the service renders (issue 10.10): one submittal with an inch file and a mm file;
 * every number in the review report, the discrepancy list and the open-discrepancies CSV carries its
 * own file's unit at that file's precision (engine formatQuantity).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { bearer, bootApp, calcFile, EMAIL, login, type TestApp } from './helpers.js';

let t: TestApp;
let checker: string;
let submittalId: number;

// Inch file (helpers.calcFile): PL 12 × 1/2 in, A36, two 3/4 in bolts straight across, hole width
// 13/16 + 1/16 = 0.875 in (AISC 360 Table J3.3, B4.3b). By hand: Ag = 6.000 in²; wn = 12 − 2(0.875)
// = 10.250 in; An = Ae = 5.125 in²; yielding 0.90·36·6.000 = 194.4 kip; rupture 0.75·58·5.125 =
// 222.9 kip. Claimed An 6.0 in² overstates it (LG101).
// Mm file: schema/examples/south-hanger-missed-chain.json, whose meta.notes give by hand Ag 4000 mm²,
// wn 186.7 mm, An = Ae = 2987.6 mm², yielding 1242.0 kN, rupture 1008.3 kN; claimed An 3232 mm².
const mmFile = readFileSync(
  join(__dirname, '..', '..', 'schema', 'examples', 'south-hanger-missed-chain.json'),
);

beforeAll(async () => {
  t = await bootApp();
  checker = await login(t.http, EMAIL.checker);
  const res = await request(t.http)
    .post('/api/projects/1/submittals')
    .set(bearer(checker))
    .field('title', 'Mixed units: deck plate (in) and south hanger (mm)')
    .attach('files', calcFile('SP-IN', { claims: { An: 6.0 } }), 'deck-plate-in.json')
    .attach('files', mmFile, 'south-hanger-mm.json');
  expect(res.status).toBe(201);
  submittalId = res.body.submittalId as number;
});
afterAll(async () => t.close());

describe('the review report writes each member in its own file’s units', () => {
  it('an inch member: in², in, kip to 0.001 in² and 0.1 kip', async () => {
    const html = (await request(t.http).get(`/api/submittals/${submittalId}/report`).set(bearer(checker)))
      .text;
    expect(html).toContain(
      '<td>deck-plate-in.json</td><td>SP-IN</td><td>AISC 360-22 LRFD</td>\n' +
        '<td class="n">6.000 in²</td><td class="n">5.125 in²</td><td class="n">1.000</td><td class="n">5.125 in²</td>\n' +
        '<td>-x: A1–B1 (wn 10.250 in)</td><td class="n">194.4 kip</td><td class="n">222.9 kip</td><td class="n"><b>194.4 kip</b></td>',
    );
    expect(html).toMatch(
      /<td>LG101<\/td><td>error<\/td><td>overstated<\/td><td>SP-IN<\/td>\n<td><\/td><td class="n">6\.000 in²<\/td><td class="n">5\.125 in²<\/td>/,
    );
  });

  it('a mm member: mm², mm, kN to whole mm² and 0.1 kN', async () => {
    const html = (await request(t.http).get(`/api/submittals/${submittalId}/report`).set(bearer(checker)))
      .text;
    expect(html).toContain(
      '<td>south-hanger-mm.json</td><td>H-S1</td><td>AISC 360-22 LRFD</td>\n' +
        '<td class="n">4000 mm²</td><td class="n">2988 mm²</td><td class="n">1.000</td><td class="n">2988 mm²</td>\n' +
        '<td>-x: H1–H2–H3–H4 (wn 186.7 mm)</td><td class="n">1242.0 kN</td><td class="n">1008.3 kN</td><td class="n"><b>1008.3 kN</b></td>',
    );
    expect(html).toMatch(
      /<td>H-S1<\/td>\n<td>[^<]*<\/td><td class="n">3232 mm²<\/td><td class="n">2988 mm²<\/td>/,
    );
    expect(html).not.toMatch(/areas in in²|strengths available, kip/);
  });
});

describe('discrepancies carry the unit system and quantity of their numbers', () => {
  it('in the list: units of the file, quantity of the code', async () => {
    const res = await request(t.http)
      .get(`/api/projects/1/discrepancies?submittalId=${submittalId}&code=LG101`)
      .set(bearer(checker));
    const items = res.body.items as { memberId: string; units: string; quantity: string; claimed: number }[];
    expect(items.map((d) => [d.memberId, d.units, d.quantity, d.claimed])).toEqual([
      ['SP-IN', 'in', 'area', 6],
      ['H-S1', 'mm', 'area', 3232],
    ]);
  });

  it('in the open-discrepancies CSV: claimed and recomputed at the file precision, with their units', async () => {
    const csv = (
      await request(t.http).get('/api/dashboard/open-discrepancies.csv?projectId=1').set(bearer(checker))
    ).text;
    const line = (member: string) => csv.split('\r\n').find((l) => l.includes(`,"${member}","LG101",`)) ?? '';
    // quantity, claimed, recomputed, unit, unit system: numbers for a spreadsheet, rounded as the
    // file writes them (2987.64 mm² → 2988).
    expect(line('SP-IN')).toContain(',"An",6,5.125,"in²","in",');
    expect(line('H-S1')).toContain(',"An",3232,2988,"mm²","mm",');
    // A detailing finding compares a distance with the code's limit (AISC 360-16 Table J3.4: 1 in).
    expect(csv).toMatch(/,"LG202",[^\r\n]*,"edge distance",0\.875,1,"in","in",/);
  });
});

describe('each code is named by its own design method (issue 10.11)', () => {
  const example = (name: string, method: string) => {
    const doc = JSON.parse(readFileSync(join(__dirname, '..', '..', 'schema', 'examples', name), 'utf8')) as {
      code: { method: string };
    };
    doc.code.method = method;
    return Buffer.from(JSON.stringify(doc));
  };

  it('EN 1993-1-1 and CSA S16 files, one written to 1.0 with "LRFD": never labelled LRFD', async () => {
    const res = await request(t.http)
      .post('/api/projects/1/submittals')
      .set(bearer(checker))
      .field('title', 'EN deck tie (1.0 file saying LRFD) and CSA lap splice')
      .attach('files', example('lantern-deck-en1993.json', 'LRFD'), 'deck-en1993.json')
      .attach('files', example('lantern-lap-csa.json', 'LSD'), 'lap-csa.json');
    expect(res.status).toBe(201);
    const id = res.body.submittalId as number;
    const results = (await request(t.http).get(`/api/submittals/${id}/results`).set(bearer(checker)))
      .body as { fileName: string; profile: { method: string; label: string } }[];
    expect([
      ...new Set(results.map((r) => `${r.fileName}: ${r.profile.method} · ${r.profile.label}`)),
    ]).toEqual([
      'deck-en1993.json: partial-factor · EN 1993-1-1, partial factors γM0 1.00, γM2 1.25',
      'lap-csa.json: LSD · CSA S16-19, limit states design φ 0.90, φu 0.75',
    ]);
    const html = (await request(t.http).get(`/api/submittals/${id}/report`).set(bearer(checker))).text;
    expect(html).toContain('<td>EN 1993-1-1, partial factors γM0 1.00, γM2 1.25</td>');
    expect(html).toContain('<td>CSA S16-19, limit states design φ 0.90, φu 0.75</td>');
    expect(html).not.toMatch(/(EN 1993-1-1|CSA S16-19) LRFD/);
  });
});
