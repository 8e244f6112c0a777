import type { Response } from 'superagent';
import { Report } from '../src/reports/models/report.model';
import { houseBody } from './fixtures';
import { pdfText } from './pdf-text';
import { bearer, createTestApp, ifMatch, signIn, versionOf, type TestApp } from './test-app';

/** Binary bodies (PDF) as a Buffer. */
const binary = (res: Response, callback: (error: Error | null, body: Buffer) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => callback(null, Buffer.concat(chunks)));
};
const squash = (text: string) => text.replace(/\s/g, '');

// Conversions written out here, not taken from the code under test:
// 1 kW = 1000 W; International Table Btu = 1055.05585262 J, so 1 Btu/h = 1055.05585262 / 3600 W;
// 1 cfm = 0.3048³ m³ per 60 s = 0.028316846592 / 60 m³/s (the foot is exactly 0.3048 m).
const kW = (watts: number) =>
  `${(watts / 1000).toLocaleString('en-US', { minimumFractionDigits: 1, maximumFractionDigits: 1 })} kW`;
const btuPerHour = (watts: number) => `${Math.round(watts / (1055.05585262 / 3600)).toLocaleString('en-US')} Btu/h`;
const CUBIC_METRES_PER_SECOND_PER_CFM = 0.028316846592 / 60;
/** Whole US dollars as Intl writes them (the farm's currency is the default, USD). */
const usd = (amount: number) =>
  new Intl.NumberFormat('en-US', {
    style: 'currency',
    currency: 'USD',
    minimumFractionDigits: 0,
    maximumFractionDigits: 0,
  }).format(amount);

interface Column {
  key: string;
  alternativeId: number | null;
  name: string;
  costAmount: number | null;
  invalid: { field: string; message: string } | null;
  heating: {
    heatLoss: { totalW: number; insideC: number };
    heater: { verdict: string; requiredOutputW: number; installedOutputW: number };
  } | null;
  cooling: { capacity: { requiredFlowM3PerS: number; installedFlowM3PerS: number; verdict: string } } | null;
  season: { fuel: { unitSi: string; label: string }; total: { cost: number | null; fuelQuantitySi: number } } | null;
  versusHouse: { yearlySaving: number | null; paybackYears: number | null; paybackStatus: string } | null;
}
interface Section {
  heading: string;
  blocks: Array<{ kind: string; text?: string; columns?: string[]; rows?: string[][]; items?: string[] }>;
}
interface ReportBody {
  id: number;
  snapshot: {
    version: number;
    alternatives?:
      | { status: 'compared'; savedCount: number; columns: Column[] }
      | { status: 'none' }
      | { status: 'not-available'; reason: string };
  };
  document: { sections: Section[] };
}

const HEADING = 'Alternatives compared';
const sectionOf = (report: ReportBody) => report.document.sections.find((s) => s.heading === HEADING);
const tableOf = (report: ReportBody) => sectionOf(report)!.blocks.find((b) => b.kind === 'table')!;
const rowOf = (report: ReportBody, label: string) => tableOf(report).rows!.find((row) => row[0] === label)!;

describe('a report compares the house with its saved alternatives (e2e)', () => {
  let t: TestApp;
  let adviser: string;
  let grower: string;
  let farmId: number;
  let houseId: number;
  let curtain: { id: number };
  let oneHeater: { id: number };
  let report: ReportBody;

  beforeAll(async () => {
    t = await createTestApp();
    adviser = await signIn(t, 'adviser@example.com');
    grower = await signIn(t, 'grower@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  const newHouse = async (name: string) =>
    (await t.http.post(`/api/farms/${farmId}/houses`).set(bearer(grower)).send(houseBody(name)).expect(201)).body as {
      id: number;
      name: string;
    };
  const addAlternative = async (id: number, body: object) =>
    (await t.http.post(`/api/houses/${id}/alternatives`).set(bearer(grower)).send(body).expect(201)).body as {
      id: number;
    };
  const createReport = async (id: number, title: string) =>
    (await t.http.post(`/api/houses/${id}/reports`).set(bearer(adviser)).send({ title }).expect(201))
      .body as ReportBody;
  const setUnits = (unitSystem: 'si' | 'us') =>
    t.http.patch('/api/users/me').set(bearer(adviser)).send({ unitSystem }).expect(200);

  it('stores the side-by-side of the house and both alternatives, with the same numbers as the route', async () => {
    const house = await newHouse('Report alternatives house');
    houseId = house.id;
    curtain = await addAlternative(houseId, {
      name: 'Energy curtain',
      patch: { curtainId: 'energy-screen-aluminised' },
      costAmount: 6000,
    });
    oneHeater = await addAlternative(houseId, {
      name: 'One heater only',
      patch: { heaters: [{ count: 1, ratedInputW: 50_000, efficiency: 0.8, fuelId: 'propane' }] },
    });

    await setUnits('si');
    report = await createReport(houseId, 'With alternatives');
    // the same request the report makes: defaults only, the two alternatives in list order
    const route = (
      await t.http
        .post(`/api/houses/${houseId}/side-by-side`)
        .set(bearer(adviser))
        .send({ alternativeIds: [curtain.id, oneHeater.id] })
        .expect(200)
    ).body as { columns: Column[] };

    const stored = report.snapshot.alternatives;
    expect(report.snapshot.version).toBe(1);
    expect(stored?.status).toBe('compared');
    if (stored?.status !== 'compared') return;
    expect(stored.savedCount).toBe(2);
    expect(stored.columns.map((c) => c.key)).toEqual([
      'house',
      `alternative-${curtain.id}`,
      `alternative-${oneHeater.id}`,
    ]);
    route.columns.forEach((column, i) => {
      const saved = stored.columns[i]!;
      expect(saved.name).toBe(column.name);
      expect(saved.costAmount).toBe(column.costAmount);
      expect(saved.heating?.heatLoss).toEqual(column.heating?.heatLoss);
      expect(saved.heating?.heater).toEqual(column.heating?.heater);
      expect(saved.cooling?.capacity).toEqual(column.cooling?.capacity);
      expect(saved.season?.total).toEqual(column.season?.total);
      expect(saved.season?.fuel).toEqual(column.season?.fuel);
      expect(saved.versusHouse).toEqual(column.versusHouse);
    });

    // the section, in SI, written from the route's numbers
    expect(tableOf(report).columns).toEqual([
      '',
      'Report alternatives house as it is',
      'Energy curtain',
      'One heater only',
    ]);
    expect(rowOf(report, 'What it changes')).toEqual([
      'What it changes',
      'Nothing: the house as it is',
      'Changes curtain',
      'Changes heaters',
    ]);
    expect(rowOf(report, 'Installed cost')).toEqual(['Installed cost', '—', usd(6000), 'not entered']);
    expect(rowOf(report, 'Design heat loss')).toEqual([
      'Design heat loss',
      ...route.columns.map((c) => kW(c.heating!.heatLoss.totalW)),
    ]);
    route.columns.forEach((column, i) => {
      const cell = rowOf(report, 'Heaters on the design night')[i + 1]!;
      // the fixture's night setpoint is 15 °C
      const words = { adequate: 'Holds', short: 'Does not hold', 'none-installed': 'No heaters entered' };
      expect(cell.startsWith(words[column.heating!.heater.verdict as keyof typeof words])).toBe(true);
      expect(cell).toContain('the night setpoint (15.0 °C)');
    });
    // one 50 kW-input heater at 80 % gives 40 kW output: the fixture house's two give 80 kW
    expect(rowOf(report, 'Heater output required / installed')[3]).toMatch(/ \/ 40\.0 kW$/);
    expect(rowOf(report, 'Heater output required / installed')[1]).toMatch(/ \/ 80\.0 kW$/);
    // the fixture's two fans of 5 m³/s each: 10 m³/s installed
    expect(rowOf(report, 'Exhaust air, summer')[1]).toBe(
      `${route.columns[0]!.cooling!.capacity.requiredFlowM3PerS.toFixed(2)} m³/s required; 10.00 m³/s installed` +
        (route.columns[0]!.cooling!.capacity.verdict === 'short' ? ' (short)' : ''),
    );
    const houseCost = route.columns[0]!.season!.total.cost!;
    const curtainCost = route.columns[1]!.season!.total.cost!;
    expect(rowOf(report, 'Season fuel cost')).toEqual([
      'Season fuel cost',
      ...route.columns.map((c) => usd(c.season!.total.cost!)),
    ]);
    expect(rowOf(report, 'Season fuel')[1]).toBe(
      `Propane (LP gas): ${Math.round(route.columns[0]!.season!.total.fuelQuantitySi).toLocaleString('en-US')} L`,
    );
    // saving = the house's season cost − the alternative's; payback = installed cost ÷ saving
    const saving = houseCost - curtainCost;
    expect(saving).toBeGreaterThan(0);
    expect(rowOf(report, 'Saving a year against the house')[2]).toBe(usd(saving));
    expect(rowOf(report, 'Simple payback')[2]).toBe(`${(6000 / saving).toFixed(1)} years`);
    expect(rowOf(report, 'Simple payback')[3]).toBe('no cost entered');
    expect(rowOf(report, 'Simple payback')[1]).toBe('—');
  });

  it("writes the section in the reader's units", async () => {
    await setUnits('us');
    const us = (await t.http.get(`/api/reports/${report.id}`).set(bearer(adviser)).expect(200)).body as ReportBody;
    const stored = report.snapshot.alternatives as { columns: Column[] };
    expect(rowOf(us, 'Design heat loss').slice(1)).toEqual(
      stored.columns.map((c) => btuPerHour(c.heating!.heatLoss.totalW)),
    );
    const installedCfm = Math.round(10 / CUBIC_METRES_PER_SECOND_PER_CFM); // 21,189 cfm
    expect(rowOf(us, 'Exhaust air, summer')[1]).toContain(`${installedCfm.toLocaleString('en-US')} cfm installed`);
    expect(rowOf(us, 'Season fuel')[1]).toMatch(/^Propane \(LP gas\): [\d,]+ US gal$/);
    expect(rowOf(us, 'Heaters on the design night')[1]).toContain('(59.0 °F)'); // 15 °C × 9/5 + 32
  });

  it('prints the section in the PDF', async () => {
    await setUnits('si');
    const res = await t.http
      .get(`/api/reports/${report.id}.pdf`)
      .set(bearer(adviser))
      .buffer(true)
      .parse(binary)
      .expect(200);
    const text = squash(await pdfText(res.body as Buffer));
    const stored = report.snapshot.alternatives as { columns: Column[] };
    expect(text).toContain(squash(HEADING));
    for (const name of ['Energy curtain', 'One heater only', 'Simple payback', 'Changes curtain']) {
      expect(text).toContain(squash(name));
    }
    for (const column of stored.columns) expect(text).toContain(squash(kW(column.heating!.heatLoss.totalW)));
    expect(text).toContain(squash(rowOf(report, 'Simple payback')[2]!));
  });

  it('keeps the section as it was when an alternative is edited or deleted, or the house changes', async () => {
    const before = (await t.http.get(`/api/reports/${report.id}`).set(bearer(adviser)).expect(200)).body as ReportBody;
    await t.http
      .patch(`/api/alternatives/${curtain.id}`)
      .set(bearer(grower))
      .send({ name: 'Curtain, renamed', costAmount: 1, patch: { curtainId: 'pe-film-curtain' } })
      .expect(200);
    await t.http.delete(`/api/alternatives/${oneHeater.id}`).set(bearer(grower)).expect(204);
    await t.http
      .patch(`/api/houses/${houseId}`)
      .set(bearer(grower))
      .set(ifMatch(await versionOf(t, grower, `/api/houses/${houseId}`)))
      .send({ widthM: 12 })
      .expect(200);

    const after = (await t.http.get(`/api/reports/${report.id}`).set(bearer(adviser)).expect(200)).body as ReportBody;
    expect(after.snapshot).toEqual(before.snapshot);
    expect(sectionOf(after)).toEqual(sectionOf(before));

    // a report taken now sees the edits
    const fresh = await createReport(houseId, 'After the edits');
    expect(fresh.snapshot.alternatives).toMatchObject({ status: 'compared', savedCount: 1 });
    expect(tableOf(fresh).columns).toEqual(['', 'Report alternatives house as it is', 'Curtain, renamed']);
    expect(rowOf(fresh, 'Installed cost')[2]).toBe(usd(1));
  });

  it('renders a report saved before reports compared alternatives, without the section', async () => {
    const row = (await Report.findByPk(report.id))!;
    const { alternatives: _dropped, ...old } = row.snapshot as unknown as Record<string, unknown>;
    await Report.update({ snapshot: old as unknown as Report['snapshot'] }, { where: { id: report.id } });

    const rendered = (await t.http.get(`/api/reports/${report.id}`).set(bearer(adviser)).expect(200))
      .body as ReportBody;
    expect(rendered.snapshot.alternatives).toBeUndefined();
    expect(rendered.document.sections.map((s) => s.heading)).toEqual(
      report.document.sections.map((s) => s.heading).filter((heading) => heading !== HEADING),
    );
    const safety = (r: ReportBody) => r.document.sections.find((s) => s.heading === 'Safety')!.blocks[0]!.items!;
    expect(safety(rendered).every((item) => !item.startsWith('If “'))).toBe(true);
    const res = await t.http
      .get(`/api/reports/${report.id}.pdf`)
      .set(bearer(adviser))
      .buffer(true)
      .parse(binary)
      .expect(200);
    const text = await pdfText(res.body as Buffer);
    expect(text).toContain('Heat loss on the design night');
    expect(text).not.toContain(HEADING);
  });

  it('says so in one sentence when the house has no alternatives', async () => {
    const bare = await newHouse('House without alternatives');
    const created = await createReport(bare.id, 'No alternatives');
    expect(created.snapshot.alternatives).toEqual({ status: 'none' });
    expect(sectionOf(created)?.blocks).toEqual([
      { kind: 'paragraph', text: 'The house had no saved alternatives when this report was taken.' },
    ]);
  });

  it('compares the four newest of five alternatives, as the alternatives list links them', async () => {
    const house = await newHouse('Five alternatives house');
    const ids: number[] = [];
    for (const nightHeatingC of [10, 11, 12, 13, 14]) {
      ids.push(
        (
          await addAlternative(house.id, {
            name: `Night at ${nightHeatingC} °C`,
            patch: { setpoints: { nightHeatingC } },
          })
        ).id,
      );
    }
    const created = await createReport(house.id, 'Five alternatives');
    expect(created.snapshot.alternatives).toMatchObject({ status: 'compared', savedCount: 5 });
    const stored = created.snapshot.alternatives as { columns: Column[] };
    expect(stored.columns.map((c) => c.alternativeId)).toEqual([null, ...ids.slice(1)]);
    expect(sectionOf(created)!.blocks[0]!.text).toMatch(
      /^The house had 5 saved alternatives; the 4 newest are compared/,
    );
    expect(rowOf(created, 'What it changes')[1 + 1]).toBe('Changes night heating setpoint');
  });
});
