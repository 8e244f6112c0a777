/**
 * Speed of the season engine (run: npm run bench -w backend). Prints medians; no assertions.
 *  1. one hourly-year simulation of a demo-like house (the loop measures and comparisons re-run),
 *  2. a bare loop doing the same arithmetic over 8,760 precomputed hours, and the ratio 1 ÷ 2,
 *  3. computing a site's sun positions and clear-sky irradiance for a year (done once per site-year),
 *  4. a whole estimateSeason call with the sun already cached (heat loss, climate curve, the
 *     simulation and the four extra runs of the degree-day comparison).
 */
import { loadReferenceData } from '../reference-data/load-reference-data';
import { baseVariant, estimateSeason, prepareSeason, variantParameters } from '../engine/estimate-season';
import { demoSeasonInput } from '../engine/season/demo-season';
import { simulateSeason } from '../engine/season/season-simulation';
import { precomputeSunHours, SunCache } from '../engine/season/sun-hours';

function medianMs(runs: number, work: () => number): { medianMs: number; sink: number } {
  const times: number[] = [];
  let sink = 0;
  for (let run = 0; run < runs; run++) {
    const start = process.hrtime.bigint();
    sink += work();
    times.push(Number(process.hrtime.bigint() - start) / 1e6);
  }
  times.sort((a, b) => a - b);
  return { medianMs: times[Math.floor(times.length / 2)], sink };
}

function main(): void {
  const ref = loadReferenceData();
  const input = demoSeasonInput();
  const sunCache = new SunCache();
  const prepared = prepareSeason(input, ref, sunCache);
  const variant = baseVariant(prepared);
  const { parameters } = variantParameters(prepared, variant, ref);
  const hours = prepared.hours;

  // The bare loop's inputs: the same 8,760 outdoor temperatures and solar gains, one setpoint.
  const hourCount = hours.hourCount;
  const outdoorC = hours.outdoorC;
  const gainW = new Float64Array(hourCount);
  for (let hour = 0; hour < hourCount; hour++) {
    gainW[hour] = parameters.solarGainAreaM2 * hours.clearnessOfDay[(hour / 24) | 0] * hours.clearSkyGlobalHorizontalWPerM2[hour];
  }
  const ua = parameters.uaDayWPerK;
  const setpointC = input.house.setpoints.nightHeatingC;
  const bareLoop = (): number => {
    let totalWh = 0;
    for (let hour = 0; hour < hourCount; hour++) {
      const heatW = ua * (setpointC - outdoorC[hour]) - gainW[hour];
      if (heatW > 0) totalWh += heatW;
    }
    return totalWh;
  };
  const simulation = (): number => simulateSeason(hours, parameters).totalHeatWh;

  // warm up the JIT
  for (let run = 0; run < 300; run++) {
    bareLoop();
    simulation();
  }
  const bare = medianMs(1001, bareLoop);
  const simulated = medianMs(1001, simulation);
  const sun = medianMs(9, () => precomputeSunHours({ latitudeDeg: 42, longitudeDeg: -72.5, utcOffsetHours: -5 }, 2026, ref).hourCount);
  estimateSeason(input, ref, sunCache);
  const whole = medianMs(51, () => estimateSeason(input, ref, sunCache).total.energyKWh);

  const format = (ms: number) => `${ms.toFixed(3)} ms`;
  console.log(`Season engine benchmark (${hourCount} hours, demo house, median of repeated runs)`);
  console.log(`  hourly-year simulation:            ${format(simulated.medianMs)}`);
  console.log(`  bare loop, same arithmetic:        ${format(bare.medianMs)}`);
  console.log(`  ratio simulation / bare loop:      ${(simulated.medianMs / bare.medianMs).toFixed(2)}×`);
  console.log(`  sun positions for a site-year:     ${format(sun.medianMs)}`);
  console.log(`  whole estimateSeason (sun cached): ${format(whole.medianMs)}`);
  // keep the results alive so no loop is optimised away
  if (!Number.isFinite(bare.sink + simulated.sink + sun.sink + whole.sink)) console.log('non-finite result');
}

main();
