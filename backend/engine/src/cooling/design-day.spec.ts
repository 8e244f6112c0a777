import { loadReferenceData } from '../testing/reference-data';
import { designDayBalance, hourlyIndoorBalance, outdoorTemperatureProfileC, type DesignDayInput } from './design-day';

const ref = loadReferenceData();

describe('hourlyIndoorBalance (steady state)', () => {
  const base = {
    solarGainW: 100_000,
    conductanceWPerK: 2_000,
    outdoorC: 30,
    supplyAirC: 30,
    maxVentilationWPerK: 20_000,
    coolingSetpointC: 25,
  };

  it('without a heat gain the house sits at the outdoor temperature with fans off', () => {
    const result = hourlyIndoorBalance({ ...base, solarGainW: 0, outdoorC: 20, supplyAirC: 20 });
    expect(result).toEqual({ indoorC: 20, fanFraction: 0, setpointHeld: true });
  });

  it('all fans on: T_i = T_o + Q / (UA + ρc_pV̇) (hand check: 30 + 100 kW / 22 kW/K = 34.55 °C)', () => {
    const result = hourlyIndoorBalance(base);
    expect(result.indoorC).toBeCloseTo(30 + 100_000 / 22_000, 6);
    expect(result.fanFraction).toBe(1);
    expect(result.setpointHeld).toBe(false);
  });

  it('stages fans to hold the setpoint when it can: fraction = (Q + UA(T_o − T_sp)) / (ρc_pV̇ (T_sp − T_supply))', () => {
    // outdoor 20, setpoint 25: needed = (100 000 − 2 000 × 5) / 5 = 18 000 W/K → 0.9 of 20 000
    const result = hourlyIndoorBalance({ ...base, outdoorC: 20, supplyAirC: 20 });
    expect(result.indoorC).toBe(25);
    expect(result.fanFraction).toBeCloseTo(0.9, 10);
    expect(result.setpointHeld).toBe(true);
  });

  it('cooler supply air (pads) lowers the indoor temperature', () => {
    const fans = hourlyIndoorBalance(base);
    const pads = hourlyIndoorBalance({ ...base, supplyAirC: 24 });
    expect(pads.indoorC).toBeLessThan(fans.indoorC);
    // (100 000 + 2 000 × 30 + 20 000 × 24) / 22 000 = 29.09 °C
    expect(pads.indoorC).toBeCloseTo(640_000 / 22_000, 6);
  });

  it('with no fans the unventilated temperature stands and the setpoint is not held', () => {
    const result = hourlyIndoorBalance({ ...base, maxVentilationWPerK: 0 });
    expect(result.indoorC).toBeCloseTo(80, 6);
    expect(result.setpointHeld).toBe(false);
  });
});

describe('outdoorTemperatureProfileC', () => {
  it('reaches the design maximum at 15:00 and max − range at 05:00 solar time', () => {
    const profile = outdoorTemperatureProfileC(35, 12, ref);
    expect(profile).toHaveLength(24);
    expect(profile[15]).toBeCloseTo(35, 10);
    expect(profile[5]).toBeCloseTo(23, 10);
    expect(Math.max(...profile)).toBeCloseTo(35, 10);
    expect(Math.min(...profile)).toBeCloseTo(23, 10);
  });
});

describe('designDayBalance', () => {
  const input: DesignDayInput = {
    date: '2026-07-21',
    latitudeDeg: 33.75,
    longitudeDeg: -84.39,
    elevationM: 300,
    summerDesignC: 34,
    dailyRangeK: 10,
    summerDesignWetBulbC: 23.5,
    floorAreaM2: 270,
    roofLightTransmittance: 0.78,
    shadeTransmittance: 1,
    transpirationFraction: 0.5,
    conductanceWPerK: 2_300,
    installedFlowM3PerS: 15,
    coolingSetpointC: 27,
    padSaturationEfficiency: 0.8,
  };

  it('has 24 solar hours with the sun highest at hour 12 and no solar gain at night', () => {
    const result = designDayBalance(input, ref);
    expect(result.hours.map((h) => h.hour)).toEqual([...Array(24).keys()]);
    const noon = result.hours[12];
    for (const hour of result.hours) {
      expect(hour.sunAltitudeDeg).toBeLessThanOrEqual(noon.sunAltitudeDeg);
      if (hour.sunAltitudeDeg <= 0) {
        expect(hour.solarGainW).toBe(0);
        expect(hour.globalHorizontalWPerM2).toBe(0);
      }
    }
    // noon altitude at 33.75° N on 21 July ≈ 90 − 33.75 + 20.5 ≈ 76.8°
    expect(noon.sunAltitudeDeg).toBeGreaterThan(75.5);
    expect(noon.sunAltitudeDeg).toBeLessThan(78);
  });

  it('solar gain = G_h × τ × (1 − transpiration) × floor area', () => {
    const result = designDayBalance(input, ref);
    const hour = result.hours[12];
    expect(hour.solarGainW).toBeCloseTo(hour.globalHorizontalWPerM2 * 0.78 * 0.5 * 270, 6);
  });

  it('pads keep the house cooler than fans alone and the peak is reported', () => {
    const result = designDayBalance(input, ref);
    expect(result.peakIndoorWithPadsC).not.toBeNull();
    expect(result.peakIndoorWithPadsC!).toBeLessThan(result.peakIndoorWithFansC);
    expect(result.peakIndoorWithFansC).toBe(Math.max(...result.hours.map((h) => h.indoorWithFansC)));
    // pad air at the 34 °C / 23.5 °C wet-bulb peak: 34 − 0.8 × 10.5 = 25.6 °C
    expect(result.padLeavingAirAtPeakC).toBeCloseTo(25.6, 1);
  });

  it('lists the hours where the setpoint is not held', () => {
    const fansOnly = designDayBalance({ ...input, padSaturationEfficiency: null }, ref);
    expect(fansOnly.peakIndoorWithPadsC).toBeNull();
    expect(fansOnly.hoursNotHeld).toEqual(
      fansOnly.hours.filter((h) => h.indoorWithFansC > 27 + 1e-9).map((h) => h.hour),
    );
    expect(fansOnly.hoursNotHeld).toContain(13);
    expect(fansOnly.hoursNotHeld).not.toContain(3);
  });

  it('a 50 % shade cloth halves the solar term every hour: G_h × 0.78 × 0.5 × (1 − 0.5) × 270', () => {
    const open = designDayBalance(input, ref);
    const shaded = designDayBalance({ ...input, shadeTransmittance: 0.5 }, ref);
    shaded.hours.forEach((hour, index) => {
      // the sun outside is the same; only what reaches the crop changes
      expect(hour.globalHorizontalWPerM2).toBe(open.hours[index].globalHorizontalWPerM2);
      expect(hour.solarGainW).toBeCloseTo(hour.globalHorizontalWPerM2 * 0.78 * 0.5 * (1 - 0.5) * 270, 6);
      expect(hour.solarGainW).toBeCloseTo(open.hours[index].solarGainW / 2, 6);
    });
    // the light under roof and cloth is the peak outdoor irradiance × 0.78 × 0.5
    expect(shaded.peakGlobalHorizontalWPerM2).toBe(Math.max(...open.hours.map((h) => h.globalHorizontalWPerM2)));
    expect(shaded.peakInteriorIrradianceWPerM2).toBeCloseTo(shaded.peakGlobalHorizontalWPerM2 * 0.78 * 0.5, 9);
    expect(open.peakInteriorIrradianceWPerM2).toBeCloseTo(open.peakGlobalHorizontalWPerM2 * 0.78, 9);
    // less sun never warms the house
    expect(shaded.peakIndoorWithFansC).toBeLessThan(open.peakIndoorWithFansC);
    expect(shaded.hoursNotHeld.length).toBeLessThanOrEqual(open.hoursNotHeld.length);
  });

  it('names the air each hour draws in: the pad leaving air with pads, the outdoor air without', () => {
    const withPads = designDayBalance(input, ref);
    const fansOnly = designDayBalance({ ...input, padSaturationEfficiency: null }, ref);
    expect(fansOnly.supplyAirByHourC).toEqual(fansOnly.hours.map((h) => h.outdoorC));
    // at the 15:00 outdoor peak: 34 − 0.8 × (34 − 23.5) = 25.6 °C
    expect(withPads.supplyAirByHourC[15]).toBeCloseTo(25.6, 1);
    expect(withPads.supplyAirByHourC[15]).toBe(withPads.padLeavingAirAtPeakC);
  });
});
