import { loadReferenceData } from '../testing/reference-data';
import { cloudCoverTenthsFromClearness, skyConstants } from '../heating/sky-radiation';
import { nightSky, type NightSkyInput } from './season-sky';

const ref = loadReferenceData();
const sky = skyConstants(ref);

/** One day: hours 0–6 and 18–23 are night, 7 is half day, 8–17 are day; the air is `airC` all day. */
function oneDay(overrides: Partial<NightSkyInput> & { airC?: number } = {}): NightSkyInput {
  const dayFraction = new Float64Array(24);
  for (let hour = 8; hour < 18; hour++) dayFraction[hour] = 1;
  dayFraction[7] = 0.5;
  return {
    outdoorC: new Float64Array(24).fill(overrides.airC ?? -10),
    dayFraction,
    dailyMinC: new Float64Array([-12]),
    clearnessOfDay: new Float64Array([0.7]),
    monthOfDay: new Uint8Array([1]),
    dewPointCByMonth: null,
    ...overrides,
  };
}

describe('cloud cover from the month’s clearness (Kasten & Czeplak 1980, inverted)', () => {
  it('N/8 = ((1 − K)/0.75)^(1/3.4), clamped to 0–1, in tenths', () => {
    // hand arithmetic: K = 0.7 → (0.3/0.75)^(1/3.4) = 0.4^0.294118 = 0.763763 → 7.63763 tenths
    expect(cloudCoverTenthsFromClearness(0.7, sky)).toBeCloseTo(7.63763, 4);
    // K = 0.5 → (2/3)^0.294118 = 0.887582 → 8.87582 tenths
    expect(cloudCoverTenthsFromClearness(0.5, sky)).toBeCloseTo(8.87582, 4);
    // back through the published form: 1 − 0.75 × 0.887582^3.4 = 0.5
    expect(1 - 0.75 * (cloudCoverTenthsFromClearness(0.5, sky) / 10) ** 3.4).toBeCloseTo(0.5, 10);
    // K = 0.25 is the relation's overcast (1 − 0.75 × 1); anything darker is held at overcast
    expect(cloudCoverTenthsFromClearness(0.25, sky)).toBeCloseTo(10, 10);
    expect(cloudCoverTenthsFromClearness(0.1, sky)).toBe(10);
    expect(cloudCoverTenthsFromClearness(0, sky)).toBe(10);
    expect(cloudCoverTenthsFromClearness(1, sky)).toBe(0);
  });
});

describe('the night sky of each hour', () => {
  it('hand-worked hour: −10 °C air, day minimum −12 °C, clearness 0.70 → 77.69 W/m² to the sky', () => {
    // cloud 7.63763 tenths (above); Clark & Allen: 1 + 0.0224 × 7.63763 − 0.0035 × 7.63763² + 0.00028 × 7.63763³
    //   = 1 + 0.171083 − 0.204167 + 0.124748 = 1.091664
    // dew point = the day's minimum (FAO-56, 0 K depression), −12 °C, below the air
    // ε_clear = 0.711 + 0.56 × (−0.12) + 0.73 × 0.0144 = 0.654312 (Berdahl & Martin); ε = 0.654312 × 1.091664 = 0.714289
    // σ T⁴ = 5.670374e−8 × 263.15⁴ = 271.9100 W/m²; deficit = 271.9100 × (1 − 0.714289) = 77.6877 W/m²
    const { deficitWPerM2, cloudCoverTenthsOfDay } = nightSky(oneDay(), sky);
    expect(cloudCoverTenthsOfDay[0]).toBeCloseTo(7.63763, 4);
    expect(deficitWPerM2[2]).toBeCloseTo(77.6877, 3);
    // the half-day hour still has a night share; whole day hours carry nothing
    expect(deficitWPerM2[7]).toBeCloseTo(77.6877, 3);
    expect(deficitWPerM2[12]).toBe(0);
  });

  it('uses the climate’s dew point for its month where it gives one', () => {
    // dew point −20 °C: ε_clear = 0.711 − 0.112 + 0.0292 = 0.6282; × 1.091664 = 0.685783
    // deficit = 271.9100 × (1 − 0.685783) = 85.4389 W/m² (drier air: a colder sky)
    const dewPointCByMonth = [-20, ...new Array<number | null>(11).fill(null)];
    const { deficitWPerM2 } = nightSky(oneDay({ dewPointCByMonth }), sky);
    expect(deficitWPerM2[2]).toBeCloseTo(85.4389, 3);
    // a dew point above the air is held at the air temperature (−10 °C): ε_clear 0.6623 × 1.091664 = 0.723008
    const humid = nightSky(oneDay({ dewPointCByMonth: [5, ...new Array<number | null>(11).fill(null)] }), sky);
    expect(humid.deficitWPerM2[2]).toBeCloseTo(271.91 * (1 - 0.6623 * 1.091664), 2);
  });

  it('an overcast month (K small) gives cloud cover 10 tenths, but Clark & Allen leave much of the clear-sky loss at winter dew points', () => {
    // K = 0.1 → cloud 10 tenths (held); the cloud factor is then its largest, 1.154.
    // −10 °C air and dew point: clear ε = 0.6623, overcast ε = 0.6623 × 1.154 = 0.764294.
    // The loss under overcast is (1 − 0.764294)/(1 − 0.6623) = 0.698 of the clear-sky loss: the
    // published factor (at most +15.4 %) does not bring a cold, dry sky near ε = 1, so the data do
    // NOT give 'nearly no sky loss' under overcast in winter. Only in warm humid air does it come
    // close: dew point 20 °C, ε_clear = 0.711 + 0.112 + 0.0292 = 0.8522, overcast 0.983439, ratio 0.112.
    const at = (airC: number, dailyMinC: number, clearness: number) =>
      nightSky(
        oneDay({ airC, dailyMinC: new Float64Array([dailyMinC]), clearnessOfDay: new Float64Array([clearness]) }),
        sky,
      );
    const overcast = at(-10, -10, 0.1);
    expect(overcast.cloudCoverTenthsOfDay[0]).toBe(10);
    const clear = at(-10, -10, 1);
    expect(clear.cloudCoverTenthsOfDay[0]).toBe(0);
    expect(overcast.deficitWPerM2[2] / clear.deficitWPerM2[2]).toBeCloseTo(0.698, 3);
    const warmOvercast = at(20, 20, 0.1);
    const warmClear = at(20, 20, 1);
    expect(warmOvercast.deficitWPerM2[2] / warmClear.deficitWPerM2[2]).toBeCloseTo(0.112, 3);
  });
});
