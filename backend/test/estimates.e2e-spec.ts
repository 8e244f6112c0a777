import { DEMO_CLIMATE, DEMO_FARM } from '../src/seed/demo-scenario';
import { GABLE_HOUSE_SPEC } from './fixtures';
import { bearer, createTestApp, joinByInvitation, signIn, type TestApp } from './test-app';

/** A 9 × 30 m freestanding gable house, described in the request (nothing stored). */
const gableHouse = GABLE_HOUSE_SPEC;
const designNight = { designOutdoorC: -20, elevationM: 0, insideRelativeHumidityPct: 80 };
const summerDay = { designDate: '2026-07-21', summerDesignC: 32, dailyRangeK: 11, summerDesignWetBulbC: 23 };
const site = { latitudeDeg: 40, longitudeDeg: -83, elevationM: 250 };

type Json = Record<string, unknown>;
type Schema = {
  $ref?: string;
  allOf?: Schema[];
  oneOf?: Schema[];
  type?: string;
  enum?: unknown[];
  nullable?: boolean;
  items?: Schema;
  properties?: Record<string, Schema>;
  required?: string[];
};

/**
 * Every key of a response is described in the OpenAPI schema, every required key is present,
 * enums hold and nulls appear only where the schema allows them: the frontend's generated types
 * are exactly what the engine returns.
 */
function schemaProblems(value: unknown, schema: Schema, schemas: Record<string, Schema>, path = '$'): string[] {
  if (schema.$ref)
    return schemaProblems(value, schemas[schema.$ref.replace('#/components/schemas/', '')], schemas, path);
  if (value === null) return schema.nullable ? [] : [`${path} is null but not nullable`];
  if (schema.allOf) return schema.allOf.flatMap((part) => schemaProblems(value, part, schemas, path));
  if (schema.oneOf) {
    return schema.oneOf.some((option) => schemaProblems(value, option, schemas, path).length === 0)
      ? []
      : [`${path} matches none of oneOf`];
  }
  if (schema.enum && !schema.enum.includes(value))
    return [`${path} = ${JSON.stringify(value)} is not in ${JSON.stringify(schema.enum)}`];
  if (schema.type === 'array') {
    if (!Array.isArray(value)) return [`${path} is not an array`];
    return value.flatMap((item, index) => schemaProblems(item, schema.items as Schema, schemas, `${path}[${index}]`));
  }
  if (schema.type === 'number') return typeof value === 'number' ? [] : [`${path} is not a number`];
  if (schema.type === 'string') return typeof value === 'string' ? [] : [`${path} is not a string`];
  if (schema.type === 'boolean') return typeof value === 'boolean' ? [] : [`${path} is not a boolean`];
  if (schema.properties) {
    if (typeof value !== 'object' || Array.isArray(value)) return [`${path} is not an object`];
    const record = value as Json;
    const problems = Object.keys(record)
      .filter((key) => !(key in (schema.properties as object)))
      .map((key) => `${path}.${key} is not described in the schema`);
    for (const key of schema.required ?? [])
      if (!(key in record)) problems.push(`${path}.${key} is required but missing`);
    for (const [key, property] of Object.entries(schema.properties)) {
      if (key in record) problems.push(...schemaProblems(record[key], property, schemas, `${path}.${key}`));
    }
    return problems;
  }
  return [];
}

describe('estimates (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let farmId: number;
  let houses: Array<Json & { id: number; name: string; setpoints: { nightHeatingC: number } }>;
  let ref: Record<string, { rows: Array<Json & { id: string }> }>;
  let schemas: Record<string, Schema>;

  const row = (table: string, id: string) => {
    const found = ref[table].rows.find((r) => r.id === id);
    if (!found) throw new Error(`reference-data/${table}.json has no row ${id}`);
    return found;
  };
  const houseNamed = (prefix: string) => {
    const found = houses.find((h) => h.name.startsWith(prefix));
    if (!found) throw new Error(`no demo house ${prefix}`);
    return found;
  };
  const expectSchema = (body: unknown, schemaName: string) => {
    expect(schemas[schemaName]).toBeDefined();
    expect(schemaProblems(body, { $ref: `#/components/schemas/${schemaName}` }, schemas)).toEqual([]);
  };

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
    houses = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(grower)).expect(200)).body;
    ref = (await t.http.get('/api/reference-data').set(bearer(grower)).expect(200)).body;
    schemas = (await t.http.get('/api/docs-json').expect(200)).body.components.schemas;
  });
  afterAll(() => t.close());

  describe('POST /api/estimates (house in the body)', () => {
    it('reproduces a hand calculation of U×A×ΔT + F×P×ΔT + ρ·cp·V·ACH·ΔT/3600 from the reference rows', async () => {
      const res = await t.http
        .post('/api/estimates')
        .set(bearer(grower))
        .send({ house: gableHouse, conditions: designNight })
        .expect(200);
      const { geometry, heatLoss, assumptions } = res.body;

      // gable geometry by hand: rise 2 m, slope √(4.5² + 2²) m per side
      const slopeM = Math.hypot(4.5, 2);
      expect(geometry.floorAreaM2).toBeCloseTo(9 * 30, 6);
      expect(geometry.roofAreaM2).toBeCloseTo(2 * slopeM * 30, 6);
      expect(geometry.sidewallAreaM2).toBeCloseTo(2 * 2.5 * 30, 6);
      expect(geometry.endwallAreaM2).toBeCloseTo(2 * (9 * 2.5 + (9 * 2) / 2), 6);
      expect(geometry.perimeterM).toBeCloseTo(2 * (9 + 30), 6);
      expect(geometry.volumeM3).toBeCloseTo((9 * 2.5 + (9 * 2) / 2) * 30, 6);

      // Reference rows (handbook values recalled from memory, as their rows say): coverings
      // poly-double-inflated and polycarbonate-twin-8mm (U), perimeter-uninsulated (F),
      // air-leakage new-film-double (ACH), air-properties cp-dry-air (cp).
      const uDoublePoly = row('coverings', 'poly-double-inflated').uWPerM2K as number;
      const uTwinWall = row('coverings', 'polycarbonate-twin-8mm').uWPerM2K as number;
      const perimeterF = row('perimeter', 'perimeter-uninsulated').wPerMK as number;
      const airChangesPerHour = row('air-leakage', 'new-film-double').airChangesPerHour as number;
      const cp = row('air-properties', 'cp-dry-air').valueJPerKgK as number;

      // inside air density by hand (ideal gas), 15 °C and 80 % RH at sea level (101,325 Pa):
      // p_ws = 610.94 × exp(17.625 × 15 / (15 + 243.04)) = 1702.0 Pa (Magnus form, Alduchov & Eskridge 1996;
      // ASHRAE Fundamentals tabulates 1705.8 Pa); p_w = 0.80 × 1702.0 = 1361.6 Pa;
      // ρ = (101325 − 1361.6) / (287.042 × 288.15) + 1361.6 / (461.524 × 288.15) = 1.20858 + 0.01024 = 1.21882 kg/m³
      const density = 1.21882;
      const reported = assumptions.find((a: Json) => a.key === 'air.densityKgPerM3').value as number;
      expect(Math.abs(reported / density - 1)).toBeLessThan(1e-4);

      const deltaTK = 15 - -20; // night setpoint − design outdoor
      const roofW = uDoublePoly * geometry.roofAreaM2 * deltaTK;
      const sidewallsW = uDoublePoly * geometry.sidewallAreaM2 * deltaTK;
      const endwallsW = uTwinWall * geometry.endwallAreaM2 * deltaTK;
      const perimeterW = perimeterF * geometry.perimeterM * deltaTK;
      const infiltrationW = (density * cp * geometry.volumeM3 * airChangesPerHour * deltaTK) / 3600;
      const totalW = roofW + sidewallsW + endwallsW + perimeterW + infiltrationW;

      expect(heatLoss.deltaTK).toBe(35);
      const byKey = Object.fromEntries(heatLoss.components.map((c: Json) => [c.key, c.watts as number]));
      expect(byKey.roof).toBeCloseTo(roofW, 3);
      expect(byKey.sidewalls).toBeCloseTo(sidewallsW, 3);
      expect(byKey.endwalls).toBeCloseTo(endwallsW, 3);
      expect(byKey.perimeter).toBeCloseTo(perimeterW, 3);
      // the hand density carries about 1e-5 relative uncertainty (Magnus against ASHRAE's saturation pressure)
      expect(Math.abs(byKey.infiltration / infiltrationW - 1)).toBeLessThan(1e-4);
      expect(Math.abs(heatLoss.totalW / totalW - 1)).toBeLessThan(1e-5);
    });

    it('describes the result fully in the OpenAPI document', async () => {
      const res = await t.http
        .post('/api/estimates')
        .set(bearer(grower))
        .send({ house: gableHouse, conditions: designNight })
        .expect(200);
      expectSchema(res.body, 'HeatingEstimateDto');
    });

    it('single poly loses more than double poly for the same house', async () => {
      const single = {
        ...gableHouse,
        coverings: { roof: 'poly-single', sidewalls: 'poly-single', endwalls: 'poly-single' },
      };
      const double = {
        ...gableHouse,
        coverings: {
          roof: 'poly-double-inflated',
          sidewalls: 'poly-double-inflated',
          endwalls: 'poly-double-inflated',
        },
      };
      const singleLoss = (
        await t.http
          .post('/api/estimates')
          .set(bearer(grower))
          .send({ house: single, conditions: designNight })
          .expect(200)
      ).body.heatLoss;
      const doubleLoss = (
        await t.http
          .post('/api/estimates')
          .set(bearer(grower))
          .send({ house: double, conditions: designNight })
          .expect(200)
      ).body.heatLoss;
      expect(singleLoss.coveringW).toBeGreaterThan(doubleLoss.coveringW * 1.5);
      expect(singleLoss.totalW).toBeGreaterThan(doubleLoss.totalW);
      // same house, same air: perimeter and leakage do not change with the covering
      expect(singleLoss.perimeterW).toBeCloseTo(doubleLoss.perimeterW, 6);
      expect(singleLoss.infiltrationW).toBeCloseTo(doubleLoss.infiltrationW, 6);
    });

    it('answers 400 naming the field for an out-of-bounds value', async () => {
      const res = await t.http
        .post('/api/estimates')
        .set(bearer(grower))
        .send({ house: { ...gableHouse, widthM: 500 }, conditions: { ...designNight, insideRelativeHumidityPct: 140 } })
        .expect(400);
      const fields = res.body.details.map((d: { field: string }) => d.field);
      expect(fields).toEqual(expect.arrayContaining(['house.widthM', 'conditions.insideRelativeHumidityPct']));
    });

    it('answers 400 when house or conditions are missing', async () => {
      const res = await t.http.post('/api/estimates').set(bearer(grower)).send({ conditions: designNight }).expect(400);
      expect(res.body.details.map((d: { field: string }) => d.field)).toContain('house');
      const noSite = await t.http
        .post('/api/estimates/cooling')
        .set(bearer(grower))
        .send({ house: gableHouse, conditions: summerDay })
        .expect(400);
      expect(noSite.body.details.map((d: { field: string }) => d.field)).toContain('site');
    });

    it('names the missing part of a house (400) instead of failing on the server', async () => {
      const { setpoints: _setpoints, ...withoutSetpoints } = gableHouse;
      const res = await t.http
        .post('/api/estimates')
        .set(bearer(grower))
        .send({ house: withoutSetpoints, conditions: designNight })
        .expect(400);
      expect(res.body.field).toBe('house.setpoints');
    });

    it('answers 422 naming house.ridgeHeightM for a ridge below the eave', async () => {
      const res = await t.http
        .post('/api/estimates')
        .set(bearer(grower))
        .send({ house: { ...gableHouse, eaveHeightM: 3, ridgeHeightM: 2.5 }, conditions: designNight })
        .expect(422);
      expect(res.body.field).toBe('house.ridgeHeightM');
    });

    it('answers 422 naming the field for an unknown covering', async () => {
      const res = await t.http
        .post('/api/estimates')
        .set(bearer(grower))
        .send({
          house: { ...gableHouse, coverings: { ...gableHouse.coverings, sidewalls: 'cling-film' } },
          conditions: designNight,
        })
        .expect(422);
      expect(res.body.field).toBe('house.coverings.sidewalls');
      expect(res.body.message).toMatch(/cling-film/);
    });

    it('carries carbon monoxide and ethylene cautions for fuel-fired heaters and not for electric ones', async () => {
      const fuel = (
        await t.http
          .post('/api/estimates')
          .set(bearer(grower))
          .send({ house: gableHouse, conditions: designNight })
          .expect(200)
      ).body;
      expect(fuel.heater.fuelFired).toBe(true);
      expect(fuel.cautions.join(' ')).toMatch(/carbon monoxide/i);
      expect(fuel.cautions.join(' ')).toMatch(/ethylene/i);
      const electricHouse = {
        ...gableHouse,
        heaters: [{ count: 2, ratedInputW: 30_000, efficiency: 1, fuelId: 'electricity' }],
      };
      const electric = (
        await t.http
          .post('/api/estimates')
          .set(bearer(grower))
          .send({ house: electricHouse, conditions: designNight })
          .expect(200)
      ).body;
      expect(electric.heater.fuelFired).toBe(false);
      expect(electric.cautions.join(' ')).not.toMatch(/carbon monoxide/i);
    });

    it('needs a signed-in user', async () => {
      await t.http.post('/api/estimates').send({ house: gableHouse, conditions: designNight }).expect(401);
      await t.http.post('/api/estimates/cooling').send({ house: gableHouse, site, conditions: summerDay }).expect(401);
    });
  });

  describe('POST /api/houses/:houseId/estimate', () => {
    it("uses the farm's winter design temperature, the farm's elevation, the reference RH and the house night setpoint", async () => {
      const house = houseNamed('House A');
      const res = await t.http.post(`/api/houses/${house.id}/estimate`).set(bearer(grower)).send({}).expect(200);
      const defaultRh = row('estimate-defaults', 'design-night-inside-rh');
      expect(defaultRh.confidence).toBe('common-practice');
      expect(res.body.houseId).toBe(house.id);
      expect(res.body.heatLoss.outsideC).toBe(DEMO_CLIMATE.winterDesignC);
      expect(res.body.heatLoss.insideC).toBe(house.setpoints.nightHeatingC);
      expect(res.body.conditionsUsed).toEqual({
        designOutdoorC: DEMO_CLIMATE.winterDesignC,
        elevationM: DEMO_FARM.elevationM,
        insideRelativeHumidityPct: defaultRh.valuePct,
        insideC: house.setpoints.nightHeatingC,
        curtainClosed: false,
        // the demo climate gives no wind: the 6.7 m/s the U tables assume (reference-data/wind.json)
        designWindSpeedMPerS: 6.7,
        clearSky: false,
      });
      expect(res.body.conditionsSource).toEqual({
        designOutdoorC: 'farm climate',
        elevationM: 'farm',
        insideRelativeHumidityPct: 'reference data',
        insideC: 'house night setpoint',
        curtainClosed: 'default',
        designWindSpeedMPerS: 'reference data',
        clearSky: 'default',
      });
      expect(res.body.condensation.insideRelativeHumidityPct).toBe(defaultRh.valuePct);
      expectSchema(res.body, 'HouseHeatingEstimateDto');
    });

    it('sizes for a clear night on request: the sky loss is its own part and the heaters hold less', async () => {
      const house = houseNamed('House A');
      const overcast = await t.http
        .post(`/api/houses/${house.id}/estimate`)
        .set(bearer(grower))
        .send({ conditions: { designOutdoorC: -15 } })
        .expect(200);
      const clear = await t.http
        .post(`/api/houses/${house.id}/estimate`)
        .set(bearer(grower))
        .send({ conditions: { designOutdoorC: -15, clearSky: true, outdoorDewPointC: -18 } })
        .expect(200);
      expect(overcast.body.heatLoss.skyW).toBe(0);
      expect(clear.body.conditionsUsed.clearSky).toBe(true);
      expect(clear.body.conditionsSource.clearSky).toBe('request');
      const sky = clear.body.heatLoss.components.find((part: { key: string }) => part.key === 'sky');
      expect(sky.watts).toBeCloseTo(clear.body.heatLoss.skyW, 6);
      expect(clear.body.heatLoss.totalW).toBeCloseTo(overcast.body.heatLoss.totalW + clear.body.heatLoss.skyW, 3);
      expectSchema(clear.body, 'HouseHeatingEstimateDto');
      const tooWet = await t.http
        .post(`/api/houses/${house.id}/estimate`)
        .set(bearer(grower))
        .send({ conditions: { designOutdoorC: -15, clearSky: true, outdoorDewPointC: -5 } })
        .expect(422);
      expect(tooWet.body.field).toBe('conditions.outdoorDewPointC');
    });

    it('lets the request replace any default, and a warmer night needs less heat', async () => {
      const house = houseNamed('House A');
      const farmNight = (await t.http.post(`/api/houses/${house.id}/estimate`).set(bearer(grower)).expect(200)).body;
      const mild = (
        await t.http
          .post(`/api/houses/${house.id}/estimate`)
          .set(bearer(grower))
          .send({ conditions: { designOutdoorC: -10, insideRelativeHumidityPct: 70 } })
          .expect(200)
      ).body;
      expect(mild.conditionsSource.designOutdoorC).toBe('request');
      expect(mild.conditionsSource.insideRelativeHumidityPct).toBe('request');
      expect(mild.conditionsSource.elevationM).toBe('farm');
      expect(mild.heatLoss.outsideC).toBe(-10);
      expect(mild.heatLoss.totalW).toBeLessThan(farmNight.heatLoss.totalW);
    });

    it('gives every demo house a full breakdown whose parts add up to the total', async () => {
      expect(houses.length).toBeGreaterThanOrEqual(3);
      for (const house of houses) {
        const body = (await t.http.post(`/api/houses/${house.id}/estimate`).set(bearer(grower)).send({}).expect(200))
          .body;
        // a kneewall is its own part where the house has one (Range C: 2 ft of concrete block)
        expect(body.heatLoss.components.map((c: Json) => c.key)).toEqual([
          'roof',
          'sidewalls',
          'endwalls',
          ...(house.kneewallId ? ['kneewall'] : []),
          'perimeter',
          'infiltration',
        ]);
        const sumW = body.heatLoss.components.reduce((sum: number, c: Json) => sum + (c.watts as number), 0);
        expect(body.heatLoss.totalW).toBeGreaterThan(0);
        expect(sumW).toBeCloseTo(body.heatLoss.totalW, 3);
        expect(
          body.heatLoss.coveringW + body.heatLoss.kneewallW + body.heatLoss.perimeterW + body.heatLoss.infiltrationW,
        ).toBeCloseTo(body.heatLoss.totalW, 3);
        expect(body.heater.requiredOutputW).toBeGreaterThan(body.heatLoss.totalW);
        expect(body.condensation.surfaces).toHaveLength(3);
        expect(body.assumptions.length).toBeGreaterThan(5);
        for (const assumption of body.assumptions) expect(assumption.source.length).toBeGreaterThan(5);
      }
    });

    it('carries carbon monoxide and ethylene cautions on the fuel-fired demo houses', async () => {
      for (const prefix of ['House A', 'House B']) {
        const body = (
          await t.http
            .post(`/api/houses/${houseNamed(prefix).id}/estimate`)
            .set(bearer(grower))
            .expect(200)
        ).body;
        expect(body.heater.fuelFired).toBe(true);
        const cautions = body.cautions.join(' ');
        expect(cautions).toMatch(/carbon monoxide/i);
        expect(cautions).toMatch(/ethylene/i);
        expect(cautions).toMatch(/licensed installers/i);
      }
    });

    it("answers 422 on conditions.designOutdoorC when the farm has no climate, asking for the farm's climate", async () => {
      const farm = (
        await t.http
          .post('/api/farms')
          .set(bearer(grower))
          .send({
            name: 'No climate yet',
            latitudeDeg: -33.9,
            longitudeDeg: 18.4,
            elevationM: 40,
            timeZone: 'Africa/Johannesburg',
          })
          .expect(201)
      ).body;
      const { id: _id, farmId: _farmId, version: _v, createdAt: _c, updatedAt: _u, ...spec } = houseNamed('House B');
      const house = (await t.http.post(`/api/farms/${farm.id}/houses`).set(bearer(grower)).send(spec).expect(201)).body;
      const res = await t.http.post(`/api/houses/${house.id}/estimate`).set(bearer(grower)).send({}).expect(422);
      expect(res.body.field).toBe('conditions.designOutdoorC');
      expect(res.body.message).toMatch(/climate/);
      const given = await t.http
        .post(`/api/houses/${house.id}/estimate`)
        .set(bearer(grower))
        .send({ conditions: { designOutdoorC: 2 } })
        .expect(200);
      expect(given.body.conditionsUsed.elevationM).toBe(40);

      const cooling = await t.http.post(`/api/houses/${house.id}/cooling`).set(bearer(grower)).send({}).expect(422);
      expect(cooling.body.field).toBe('conditions.summerDesignC');
      expect(cooling.body.message).toMatch(/climate/);
      // southern farm: the default design day is in January; no climate, so the winter figure is the reference default
      const stated = (
        await t.http
          .post(`/api/houses/${house.id}/cooling`)
          .set(bearer(grower))
          .send({ conditions: { summerDesignC: 30, dailyRangeK: 10, summerDesignWetBulbC: 20 } })
          .expect(200)
      ).body;
      expect(stated.conditionsUsed.designDate).toMatch(/^\d{4}-01-21$/);
      expect(stated.conditionsSource.winterDesignC).toBe('reference data');
    });

    it('answers 404 for a house that does not exist', async () => {
      await t.http.post('/api/houses/999999/estimate').set(bearer(grower)).send({}).expect(404);
      await t.http.post('/api/houses/999999/cooling').set(bearer(grower)).send({}).expect(404);
    });

    it('refuses an out-of-bounds override with 400', async () => {
      const res = await t.http
        .post(`/api/houses/${houseNamed('House A').id}/estimate`)
        .set(bearer(grower))
        .send({ conditions: { designOutdoorC: -90 } })
        .expect(400);
      expect(res.body.field).toBe('conditions.designOutdoorC');
    });
  });

  describe('cooling', () => {
    it('POST /api/estimates/cooling returns the design day and pad sizing, described fully in the OpenAPI document', async () => {
      const conditions = { ...summerDay, evaporativePad: { padTypeId: 'cellulose-150mm', areaM2: 8 } };
      const res = await t.http
        .post('/api/estimates/cooling')
        .set(bearer(grower))
        .send({ house: gableHouse, site, conditions })
        .expect(200);
      expect(res.body.designDay.date).toBe('2026-07-21');
      expect(res.body.designDay.hours).toHaveLength(24);
      expect(res.body.pads.padTypeId).toBe('cellulose-150mm');
      expect(res.body.designDay.peakIndoorWithPadsC).toBeLessThan(res.body.designDay.peakIndoorWithFansC);
      expect(res.body.cautions.join(' ')).toMatch(/electrician/i);
      expectSchema(res.body, 'CoolingEstimateDto');
    });

    it('POST /api/estimates/cooling refuses a malformed or impossible date (400) and an unknown pad type (422)', async () => {
      const badDate = await t.http
        .post('/api/estimates/cooling')
        .set(bearer(grower))
        .send({ house: gableHouse, site, conditions: { ...summerDay, designDate: '21/07/2026' } })
        .expect(400);
      expect(badDate.body.field).toBe('conditions.designDate');
      const notADay = await t.http
        .post('/api/estimates/cooling')
        .set(bearer(grower))
        .send({ house: gableHouse, site, conditions: { ...summerDay, designDate: '2026-02-30' } })
        .expect(400); // not on the calendar: refused with the request's other field errors
      expect(notADay.body.field).toBe('conditions.designDate');
      const pad = await t.http
        .post('/api/estimates/cooling')
        .set(bearer(grower))
        .send({
          house: gableHouse,
          site,
          conditions: { ...summerDay, evaporativePad: { padTypeId: 'straw-bale', areaM2: 8 } },
        })
        .expect(422);
      expect(pad.body.field).toBe('conditions.evaporativePad.padTypeId');
    });

    it('per house: 24 hours from the farm climate on 21 July, and House B is short of fans', async () => {
      const houseB = houseNamed('House B');
      const res = await t.http.post(`/api/houses/${houseB.id}/cooling`).set(bearer(grower)).send({}).expect(200);
      const body = res.body;
      expect(body.houseId).toBe(houseB.id);
      expect(body.designDay.hours).toHaveLength(24);
      expect(body.designDay.date).toMatch(/^\d{4}-07-21$/);
      expect(body.siteUsed).toEqual({
        latitudeDeg: DEMO_FARM.latitudeDeg,
        longitudeDeg: DEMO_FARM.longitudeDeg,
        elevationM: DEMO_FARM.elevationM,
      });
      expect(body.conditionsUsed).toMatchObject({
        summerDesignC: DEMO_CLIMATE.summerDesignC,
        summerDesignWetBulbC: DEMO_CLIMATE.summerDesignWetBulbC,
        dailyRangeK: DEMO_CLIMATE.summerDailyRangeK,
        winterDesignC: DEMO_CLIMATE.winterDesignC,
      });
      expect(body.conditionsSource).toMatchObject({
        designDate: 'calendar default',
        summerDesignC: 'farm climate',
        winterDesignC: 'farm climate',
        padToFanDistanceM: 'house length',
        evaporativePad: 'none',
      });
      expect(body.winterVentilation.atOutdoorC).toBe(DEMO_CLIMATE.winterDesignC);
      expect(Math.max(...body.designDay.hours.map((h: Json) => h.outdoorC as number))).toBeCloseTo(
        DEMO_CLIMATE.summerDesignC,
        6,
      );

      expect(body.capacity.verdict).toBe('short');
      expect(body.capacity.fansNeeded).toBeGreaterThan(
        houseB.exhaustFans ? (houseB.exhaustFans as { count: number }).count : 1,
      );
      expect(body.capacity.additionalFansNeeded).toBe(
        body.capacity.fansNeeded - (houseB.exhaustFans as { count: number }).count,
      );
      expect(body.cautions.join(' ')).toMatch(/more fan/);
      expectSchema(body, 'HouseCoolingEstimateDto');
    });

    it('per house: a stated design date and pads replace the defaults', async () => {
      const houseC = houseNamed('Range C');
      const body = (
        await t.http
          .post(`/api/houses/${houseC.id}/cooling`)
          .set(bearer(grower))
          .send({
            conditions: { designDate: '2026-08-21', evaporativePad: { padTypeId: 'cellulose-100mm', areaM2: 40 } },
          })
          .expect(200)
      ).body;
      expect(body.designDay.date).toBe('2026-08-21');
      expect(body.conditionsSource.designDate).toBe('request');
      expect(body.conditionsSource.evaporativePad).toBe('request');
      expect(body.pads.areaM2).toBe(40);
    });
  });

  describe('who may run estimates', () => {
    let adviser: string;
    let viewer: string;
    let outsider: string;

    beforeAll(async () => {
      adviser = await signIn(t, 'adviser@example.com');
      const owner = await signIn(t, 'owner@example.com');
      viewer = (
        await t.http
          .post('/api/auth/register')
          .send({ email: 'estimate-viewer@example.org', password: 'member-pass-8472', name: 'Viewer' })
          .expect(201)
      ).body.accessToken;
      await joinByInvitation(t, owner, farmId, 'estimate-viewer@example.org', 'viewer', viewer);
      outsider = (
        await t.http
          .post('/api/auth/register')
          .send({ email: 'estimate-outsider@example.org', password: 'member-pass-8472', name: 'Outsider' })
          .expect(201)
      ).body.accessToken;
    });

    it('an adviser runs heating and cooling estimates', async () => {
      const id = houseNamed('House A').id;
      await t.http.post(`/api/houses/${id}/estimate`).set(bearer(adviser)).send({}).expect(200);
      await t.http.post(`/api/houses/${id}/cooling`).set(bearer(adviser)).send({}).expect(200);
    });

    it('a viewer gets 403', async () => {
      const id = houseNamed('House A').id;
      await t.http.post(`/api/houses/${id}/estimate`).set(bearer(viewer)).send({}).expect(403);
      await t.http.post(`/api/houses/${id}/cooling`).set(bearer(viewer)).send({}).expect(403);
    });

    it('someone outside the farm gets 404', async () => {
      const id = houseNamed('House A').id;
      await t.http.post(`/api/houses/${id}/estimate`).set(bearer(outsider)).send({}).expect(404);
      await t.http.post(`/api/houses/${id}/cooling`).set(bearer(outsider)).send({}).expect(404);
    });
  });
});
