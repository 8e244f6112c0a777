import fc from 'fast-check';
import { EngineInputError } from '../errors';
import { estimateCooling, type CoolingConditions, type CoolingInput } from '../estimate-cooling';
import { exampleDoublePolyGableHouse } from '../heating/example-houses';
import type { HouseSpec, ShadeCloth } from '../house.types';
import { loadReferenceData } from '../testing/reference-data';
import { COOLING_BOUNDS, proseToPlainSi } from '../vocabulary';
import { interiorLight, lightFactor } from './required-capacity';

const ref = loadReferenceData();
const LUX_PER_FC = 10.76391; // 1 fc = 1 lm/ft² = 1 / 0.3048² lx
const site = { latitudeDeg: 33.75, longitudeDeg: -84.39, elevationM: 300 };
const july: CoolingConditions = {
  designDate: '2026-07-21',
  summerDesignC: 34,
  dailyRangeK: 10,
  summerDesignWetBulbC: 23.5,
};
const SUMMER: number[] = [5, 6, 7, 8, 9];
const fiftyPercent: ShadeCloth = { solarTransmittance: 0.5, months: SUMMER };

function run(house: Partial<HouseSpec> = {}, conditions: Partial<CoolingConditions> = {}) {
  const input: CoolingInput = {
    house: exampleDoublePolyGableHouse(house),
    site,
    conditions: { ...july, ...conditions },
  };
  return estimateCooling(input, ref);
}

function fieldOf(action: () => unknown): string | null {
  try {
    action();
  } catch (error) {
    if (error instanceof EngineInputError) return error.field;
    throw error;
  }
  return null;
}

describe('the light factor and the design day read the same sun', () => {
  it("without an entered light, the light factor reads the design day's peak sun through the roof × 110 lm/W", () => {
    const result = run();
    const peakWPerM2 = Math.max(...result.designDay.hours.map((h) => h.globalHorizontalWPerM2));
    // double inflated poly passes 0.78 of the light (reference-data/coverings.json); no kneewall;
    // 110 lm/W clear-sky daylight (Littlefair 1985, recalled: 100–120 lm/W)
    expect(result.interiorLight.from).toBe('design day');
    expect(result.interiorLight.shadeTransmittance).toBe(1);
    expect(result.interiorLight.lux).toBeCloseTo(peakWPerM2 * 0.78 * 110, 6);
    expect(result.capacity.factors.light).toBeCloseTo((peakWPerM2 * 0.78 * 110) / (5000 * LUX_PER_FC), 9);
    // growers' rule (common practice): full summer sun ≈ 10,000 fc outdoors; under double poly
    // at noon in July at 34° N that is roughly 6,500–9,000 fc
    expect(result.interiorLight.lux / LUX_PER_FC).toBeGreaterThan(6500);
    expect(result.interiorLight.lux / LUX_PER_FC).toBeLessThan(9000);
  });

  it('the design-day solar gain at the brightest hour is the light factor’s light ÷ 110 lm/W × (1 − transpiration) × floor', () => {
    for (const shadeCloth of [null, fiftyPercent]) {
      const result = run({ shadeCloth });
      const brightest = result.designDay.hours.reduce((a, b) =>
        b.globalHorizontalWPerM2 > a.globalHorizontalWPerM2 ? b : a,
      );
      // 270 m² floor, transpiration share 0.5 (reference default)
      expect(brightest.solarGainW).toBeCloseTo((result.interiorLight.lux / 110) * 0.5 * 270, 6);
    }
  });
});

describe('a shade cloth on the cooling design day', () => {
  it('a 50 % cloth in place in July halves the solar term every hour and the light the light factor reads', () => {
    const open = run();
    const shaded = run({ shadeCloth: fiftyPercent });
    shaded.designDay.hours.forEach((hour, index) => {
      expect(hour.solarGainW).toBeCloseTo(open.designDay.hours[index].solarGainW * 0.5, 6);
    });
    expect(shaded.interiorLight.shadeTransmittance).toBe(0.5);
    expect(shaded.interiorLight.unshadedLux).toBeCloseTo(open.interiorLight.lux, 9);
    expect(shaded.interiorLight.lux).toBeCloseTo(open.interiorLight.lux * 0.5, 6);
    expect(shaded.capacity.factors.light).toBeCloseTo(open.capacity.factors.light * 0.5, 9);
    expect(shaded.designDay.peakIndoorWithFansC).toBeLessThan(open.designDay.peakIndoorWithFansC);
    expect(shaded.shadeCloth).toEqual({ solarTransmittance: 0.5, months: SUMMER, inPlaceOnDesignDate: true });
  });

  it.each([
    // EP406 / NGMA light factor published points (recalled from memory): F_light = fc / 5,000,
    // 4,000 fc → 0.8, 5,000 fc → 1.0, 5,500 fc → 1.1, 6,000 fc → 1.2
    [8000, 0.5, 4000, 0.8],
    [10000, 0.5, 5000, 1.0],
    [8000, 0.7, 5600, 1.12],
    [12000, 0.5, 6000, 1.2],
  ])(
    'entered %i fc under the roof with a cloth passing %f → %i fc at the crop → F_light %f',
    (enteredFc, transmittance, shadedFc, factor) => {
      const result = run(
        { shadeCloth: { solarTransmittance: transmittance, months: [7] } },
        { peakInteriorLightLux: enteredFc * LUX_PER_FC },
      );
      expect(result.interiorLight.from).toBe('entered');
      expect(result.interiorLight.lux).toBeCloseTo(shadedFc * LUX_PER_FC, 6);
      expect(result.capacity.factors.light).toBeCloseTo(factor, 9);
      expect(lightFactor(shadedFc * LUX_PER_FC, ref)).toBeCloseTo(factor, 9);
    },
  );

  it('a cloth not in place in the design month changes nothing, and the assumptions say so', () => {
    const open = run();
    const winterOnly = run({ shadeCloth: { solarTransmittance: 0.3, months: [12, 1, 2] } });
    expect(winterOnly.interiorLight.lux).toBe(open.interiorLight.lux);
    expect(winterOnly.capacity.requiredFlowM3PerS).toBe(open.capacity.requiredFlowM3PerS);
    expect(winterOnly.designDay.hours.map((h) => h.solarGainW)).toEqual(open.designDay.hours.map((h) => h.solarGainW));
    expect(winterOnly.shadeCloth?.inPlaceOnDesignDate).toBe(false);
    const words = winterOnly.assumptions.find((a) => a.key === 'shadeCloth')?.value;
    expect(words).toBe(
      'a shade cloth passing 30 % of the sun, in place December–February: not in place in July, so it shades nothing on the design date',
    );
  });

  it('names the cloth in the assumptions in words and as the share it passes', () => {
    const shaded = run({ shadeCloth: fiftyPercent });
    expect(shaded.assumptions.find((a) => a.key === 'shadeCloth')?.value).toBe(
      'a shade cloth passing 50 % of the sun, in place May–September: in place on the design date',
    );
    expect(shaded.assumptions.find((a) => a.key === 'shadeTransmittance')?.value).toBe(0.5);
    expect(shaded.assumptions.find((a) => a.key === 'peakInteriorLightLux')?.value).toBeCloseTo(
      shaded.interiorLight.lux,
      9,
    );
    expect(run().assumptions.find((a) => a.key === 'shadeCloth')?.value).toBe('none');
    const efficacy = shaded.assumptions.find((a) => a.key === 'luminousEfficacy');
    expect(efficacy).toMatchObject({ value: 110, unit: 'lm/W', confidence: 'memory' });
  });

  it('refuses a cloth out of bounds, naming the field', () => {
    const cloth = (c: unknown) => () => run({ shadeCloth: c as ShadeCloth });
    expect(fieldOf(cloth({ solarTransmittance: 1.2, months: [7] }))).toBe('house.shadeCloth.solarTransmittance');
    expect(fieldOf(cloth({ solarTransmittance: -0.1, months: [7] }))).toBe('house.shadeCloth.solarTransmittance');
    expect(fieldOf(cloth({ solarTransmittance: 0.5, months: [13] }))).toBe('house.shadeCloth.months[0]');
    expect(fieldOf(cloth({ solarTransmittance: 0.5, months: [7, 0] }))).toBe('house.shadeCloth.months[1]');
    expect(fieldOf(cloth({ solarTransmittance: 0.5, months: [6.5] }))).toBe('house.shadeCloth.months[0]');
    expect(fieldOf(cloth({ solarTransmittance: 0.5, months: [7, 7] }))).toBe('house.shadeCloth.months[1]');
    expect(fieldOf(cloth({ solarTransmittance: 0.5 }))).toBe('house.shadeCloth.months');
    expect(fieldOf(cloth({ solarTransmittance: 0.5, months: [] }))).toBeNull();
    expect(fieldOf(cloth({ solarTransmittance: 0, months: [7] }))).toBeNull();
  });
});

describe('when "fans adequate" and "setpoint not held" can still both stand', () => {
  it('explains that the floor-area rate keeps the rise over the incoming air, not the setpoint', () => {
    // 20 fans of 5 m³/s: far above the required rate; the 34 °C afternoon is above the 27 °C setpoint
    const result = run({
      exhaustFans: { count: 20, capacityEachM3PerS: 5 },
      inletAreaM2: 60,
      setpoints: { dayHeatingC: 20, nightHeatingC: 16, coolingC: 27 },
    });
    expect(result.capacity.verdict).toBe('adequate');
    expect(result.designDay.hoursNotHeld.length).toBeGreaterThan(0);
    const explanation = result.cautions.map(proseToPlainSi).find((c) => c.startsWith('Why the fans are adequate'));
    expect(explanation).toBeDefined();
    // the default allowed rise is 7 °F = 3.9 K (reference data) over outdoor air; at 15:00 solar
    // time the outdoor air is the 34 °C design maximum, itself above the 27 °C setpoint
    expect(explanation).toContain('within 3.9 K of the outdoor air coming in');
    expect(explanation).toContain('27.0 °C cooling setpoint');
    expect(explanation).toMatch(
      /At solar hours [\d, ]*15[\d, ]* the outdoor air itself \(up to 34\.0 °C\) is at or above/,
    );
    // the hours in the list are exactly the design day's hours not held
    const listed = [...(explanation ?? '').matchAll(/At solar hours ([\d, ]+) the/g)].flatMap((m) =>
      m[1].split(', ').map(Number),
    );
    expect(listed.sort((a, b) => a - b)).toEqual(result.designDay.hoursNotHeld);
    expect(explanation).not.toContain('entered peak light');
  });

  it('names the hours where the design day’s sun outruns the rate although the incoming air plus the rise is below the setpoint', () => {
    // a 30 °C day, no transpiration (all the sun heats the air), a 35 °C setpoint, and just the fans the rate asks for
    const hot = { summerDesignC: 30, summerDesignWetBulbC: 20, transpirationFraction: 0 };
    const setpoints = { dayHeatingC: 20, nightHeatingC: 16, coolingC: 35 };
    const sized = run({ setpoints, inletAreaM2: 60 }, hot).capacity.fansNeeded as number;
    const result = run({ setpoints, inletAreaM2: 60, exhaustFans: { count: sized, capacityEachM3PerS: 5 } }, hot);
    expect(result.capacity.verdict).toBe('adequate');
    expect(result.designDay.hoursNotHeld).toContain(12);
    const explanation = result.cautions.map(proseToPlainSi).find((c) => c.startsWith('Why the fans are adequate'));
    // at noon the outdoor air is 30 − 10 × 0.23 = 27.7 °C (daily-range profile): 27.7 + 3.9 < 35
    expect(explanation).toMatch(
      /At solar hours [\d, ]*\b12\b[\d, ]* the clear-sky sun of the design day \(no shade cloth, the crop taking up 0 %/,
    );
    expect(explanation).not.toContain('is at or above the setpoint');
  });

  it('also names an entered light, which the design day does not use', () => {
    const result = run(
      {
        exhaustFans: { count: 20, capacityEachM3PerS: 5 },
        inletAreaM2: 60,
      },
      { peakInteriorLightLux: 6000 * LUX_PER_FC },
    );
    const explanation = result.cautions.find((c) => c.startsWith('Why the fans are adequate'));
    expect(explanation).toContain('entered peak light');
  });

  it('says nothing when the two agree', () => {
    const short = run({ exhaustFans: { count: 1, capacityEachM3PerS: 2 } });
    expect(short.capacity.verdict).toBe('short');
    expect(short.cautions.some((c) => c.startsWith('Why the fans are adequate'))).toBe(false);
  });
});

describe('shade never adds light (fast-check, seeded)', () => {
  const b = COOLING_BOUNDS;
  const scenario = fc.record({
    latitudeDeg: fc.double({ min: -66, max: 66, noNaN: true }),
    month: fc.integer({ min: 1, max: 12 }),
    roof: fc.constantFrom('poly-single', 'poly-double-inflated', 'glass-single', 'polycarbonate-twin-8mm'),
    enteredLux: fc.option(fc.double({ min: b.peakInteriorLightLux.min, max: b.peakInteriorLightLux.max, noNaN: true })),
    padToFanDistanceM: fc.double({ min: b.padToFanDistanceM.min, max: b.padToFanDistanceM.max, noNaN: true }),
    fans: fc.integer({ min: 0, max: 12 }),
    transmittance: fc.double({ min: 0, max: 1, noNaN: true }),
    months: fc.uniqueArray(fc.integer({ min: 1, max: 12 }), { maxLength: 12 }),
    moreShade: fc.double({ min: 0, max: 1, noNaN: true }),
  });
  type Scenario = typeof scenario extends fc.Arbitrary<infer T> ? T : never;

  function estimate(s: Scenario, shadeCloth: ShadeCloth | null) {
    return estimateCooling(
      {
        house: exampleDoublePolyGableHouse({
          coverings: { roof: s.roof, sidewalls: 'poly-double-inflated', endwalls: 'polycarbonate-twin-8mm' },
          exhaustFans: { count: s.fans, capacityEachM3PerS: s.fans === 0 ? 0 : 5 },
          shadeCloth,
        }),
        site: { latitudeDeg: s.latitudeDeg, longitudeDeg: 10, elevationM: 200 },
        conditions: {
          ...july,
          designDate: `2026-${String(s.month).padStart(2, '0')}-15`,
          padToFanDistanceM: s.padToFanDistanceM,
          ...(s.enteredLux === null ? {} : { peakInteriorLightLux: s.enteredLux }),
        },
      },
      ref,
    );
  }

  it('adding a cloth, or a denser one, never raises the interior light, the required fan flow or the indoor peak', () => {
    fc.assert(
      fc.property(scenario, (s) => {
        const none = estimate(s, null);
        const cloth = estimate(s, { solarTransmittance: s.transmittance, months: s.months });
        const denser = estimate(s, { solarTransmittance: s.transmittance * s.moreShade, months: s.months });
        for (const [lighter, darker] of [
          [none, cloth],
          [cloth, denser],
        ]) {
          expect(darker.interiorLight.lux).toBeLessThanOrEqual(lighter.interiorLight.lux);
          expect(darker.capacity.factors.light).toBeLessThanOrEqual(lighter.capacity.factors.light);
          expect(darker.capacity.requiredFlowM3PerS).toBeLessThanOrEqual(lighter.capacity.requiredFlowM3PerS);
          expect(darker.designDay.peakIndoorWithFansC).toBeLessThanOrEqual(
            lighter.designDay.peakIndoorWithFansC + 1e-9,
          );
        }
      }),
      { seed: 20261202, numRuns: 80 },
    );
  });

  it('interiorLight itself: the lux is the unshaded light times a share in [0, 1], whatever the share asked', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1200, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -2, max: 3, noNaN: true }),
        (peak, roof, shade) => {
          const open = interiorLight(
            { peakGlobalHorizontalWPerM2: peak, roofLightTransmittance: roof, shadeTransmittance: 1 },
            ref,
          );
          const shaded = interiorLight(
            { peakGlobalHorizontalWPerM2: peak, roofLightTransmittance: roof, shadeTransmittance: shade },
            ref,
          );
          expect(shaded.lux).toBeLessThanOrEqual(open.lux);
          expect(shaded.lux).toBeGreaterThanOrEqual(0);
        },
      ),
      { seed: 20261202, numRuns: 200 },
    );
  });
});
