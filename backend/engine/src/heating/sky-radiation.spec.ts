import fc from 'fast-check';
import { loadReferenceData } from '../testing/reference-data';
import { clearSkyEmissivity, skyConstants, skyEmissivity, skyRadiationLoss, skyTemperatureC } from './sky-radiation';
import { requiredRow, type CoveringRow } from './heating-reference';

const ref = loadReferenceData();
const sky = skyConstants(ref);

describe('sky emissivity and temperature', () => {
  it('Berdahl & Martin (1984): ε_clear = 0.711 + 0.56·(T_dp/100) + 0.73·(T_dp/100)²', () => {
    // hand arithmetic: T_dp = 0 → 0.711; T_dp = −10 °C → 0.711 − 0.056 + 0.0073 = 0.6623
    expect(clearSkyEmissivity(0, sky)).toBeCloseTo(0.711, 10);
    expect(clearSkyEmissivity(-10, sky)).toBeCloseTo(0.6623, 10);
  });

  it('holds the quadratic at its turning point (T_dp = −56/1.46 = −38.36 °C), so a drier sky is never warmer', () => {
    const lowest = clearSkyEmissivity(-38.3562, sky);
    expect(clearSkyEmissivity(-45, sky)).toBeCloseTo(lowest, 10);
    expect(clearSkyEmissivity(-30, sky)).toBeGreaterThan(lowest);
  });

  it('T_sky = ε^¼ × T_air: 0 °C air under ε = 0.711 → 0.711^0.25 × 273.15 K = 250.82 K (−22.3 °C)', () => {
    // 0.711^0.5 = 0.843208; its square root 0.918264; × 273.15 = 250.824 K
    expect(skyTemperatureC(0, 0.711)).toBeCloseTo(-22.33, 2);
  });

  it("agrees with Swinbank's independent clear-sky formula (1963) within 2 K on a winter night", () => {
    // Swinbank: T_sky = 0.0552 × 268.15^1.5 = 242.39 K for −5 °C air.
    // Berdahl & Martin with a 3 K dew-point depression (T_dp = −8 °C): ε = 0.711 − 0.0448 + 0.004672 = 0.670872,
    // T_sky = 0.670872^0.25 × 268.15 = 242.68 K.
    const swinbankK = 0.0552 * 268.15 ** 1.5;
    const berdahlC = skyTemperatureC(-5, clearSkyEmissivity(-8, sky));
    expect(swinbankK).toBeCloseTo(242.39, 1);
    expect(Math.abs(berdahlC + 273.15 - swinbankK)).toBeLessThan(2);
  });

  it('Clark & Allen (1978): overcast (10 tenths) multiplies ε by 1 + 0.224 − 0.35 + 0.28 = 1.154, never above 1', () => {
    expect(skyEmissivity(0.6, 10, sky)).toBeCloseTo(0.6 * 1.154, 10);
    expect(skyEmissivity(0.9, 10, sky)).toBe(1);
    expect(skyEmissivity(0.6, 0, sky)).toBe(0.6);
  });
});

describe('the loss a clear sky adds through the covering', () => {
  it('hand-worked: −15 °C air, −18 °C dew point, clear, double poly (τ 0.30), crop ε 0.95 → 26.3 W per m² of floor', () => {
    // ε = 0.711 + 0.56(−0.18) + 0.73(0.0324) = 0.633852; T_sky = 0.633852^0.25 × 258.15 = 230.34 K (−42.8 °C)
    // q = 0.30 × 0.95 × 5.670374e-8 × (258.15⁴ − 230.34⁴) = 0.285 × 5.670374e-8 × (4.44108e9 − 2.81499e9) = 26.28 W/m²
    const loss = skyRadiationLoss(
      { outdoorC: -15, dewPointC: -18, cloudCoverTenths: 0, floorAreaM2: 100, thermalIrTransmittance: 0.3 },
      sky,
    );
    expect(loss.skyEmissivity).toBeCloseTo(0.633852, 6);
    expect(loss.skyTemperatureC).toBeCloseTo(-42.81, 2);
    expect(loss.wPerM2Floor).toBeCloseTo(26.28, 1);
    expect(loss.lossW).toBeCloseTo(2628, -1);
  });

  it('nothing through an opaque covering; ordinary film loses far more than glass or an IR-absorbing inner film', () => {
    const night = { outdoorC: -10, cloudCoverTenths: 0, floorAreaM2: 1 };
    const through = (coveringId: string) =>
      skyRadiationLoss(
        {
          ...night,
          thermalIrTransmittance: requiredRow<CoveringRow>(ref, 'coverings', coveringId).thermalIrTransmittance,
        },
        sky,
      ).wPerM2Floor;
    expect(through('foam-board-50mm')).toBe(0);
    expect(through('poly-single')).toBeGreaterThan(10 * through('glass-single'));
    expect(through('poly-double-ir-inner')).toBeLessThan(through('poly-double-inflated'));
  });

  it('a clearer sky never lowers the loss of an IR-transparent film, and a drier sky is colder', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -40, max: 15, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 15, noNaN: true }),
        (outdoorC, cloudA, cloudB, depressionK) => {
          const at = (cloudCoverTenths: number, dewPointC = outdoorC - depressionK) =>
            skyRadiationLoss(
              { outdoorC, dewPointC, cloudCoverTenths, floorAreaM2: 1, thermalIrTransmittance: 0.55 },
              sky,
            ).wPerM2Floor;
          const [clearer, cloudier] = cloudA <= cloudB ? [cloudA, cloudB] : [cloudB, cloudA];
          expect(at(clearer)).toBeGreaterThanOrEqual(at(cloudier) - 1e-9);
          expect(at(clearer, outdoorC - depressionK - 1)).toBeGreaterThanOrEqual(at(clearer) - 1e-9);
          expect(at(cloudier)).toBeGreaterThanOrEqual(0);
        },
      ),
      { seed: 20261202 },
    );
  });
});
