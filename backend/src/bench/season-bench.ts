/**
 * Speed of the season engine (run: npm run bench -w @thermbay/backend). Prints medians; no assertions.
 *  1. one hourly-year simulation of a demo-like house (the loop measures and comparisons re-run),
 *  2. a bare loop doing the same per-hour arithmetic (the night sky's term included) over 8,760
 *     precomputed hours, and the ratio 1 ÷ 2,
 *  3. computing a site's sun positions and clear-sky irradiance for a year (done once per site-year),
 *  4. a whole estimateSeason call with the sun already cached (heat loss, climate curve, the
 *     simulation and the four extra runs of the degree-day comparison),
 *  5. rendering a heater-sizing report of the demo house as PDF (document building included).
 *  6. a side-by-side of a house and four alternatives (each column a design-night heating, a summer
 *     cooling and a season estimate), as POST /houses/:id/side-by-side computes it once the rows
 *     are read (sun cached, as on a running server after the first request for the site-year).
 */
import { demoSideBySideInput } from '@thermbay/engine/alternatives/demo-side-by-side';
import { compareSideBySide } from '@thermbay/engine/alternatives/side-by-side';
import { exampleDoublePolyGableHouse } from '@thermbay/engine/heating/example-houses';
import { loadReferenceData } from '../reference-data/load-reference-data';
import { benchReportPdf } from './report-pdf-bench';
import { baseVariant, estimateSeason, prepareSeason, variantParameters } from '@thermbay/engine/estimate-season';
import { demoSeasonInput } from '@thermbay/engine/season/demo-season';
import { simulateSeason } from '@thermbay/engine/season/season-simulation';
import { precomputeSunHours, SunCache } from '@thermbay/engine/season/sun-hours';

/** Median time of one call, timing batches of `batch` calls to stay well above the timer's resolution. */
function medianMs(runs: number, work: () => number, batch = 1): { medianMs: number; sink: number } {
  const times: number[] = [];
  let sink = 0;
  for (let run = 0; run < runs; run++) {
    const start = process.hrtime.bigint();
    for (let call = 0; call < batch; call++) sink += work();
    times.push(Number(process.hrtime.bigint() - start) / 1e6 / batch);
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

  // The bare loop's inputs: the same hours flattened to per-hour arrays (setpoints, solar gain,
  // daylight share), so it does the simulation's arithmetic without its bookkeeping (months,
  // peak, unheated days, night share and solar offset totals).
  const hourCount = hours.hourCount;
  const outdoorC = hours.outdoorC;
  const share = hours.dayFraction;
  const gainW = new Float64Array(hourCount);
  const daySetpointC = new Float64Array(hourCount);
  const nightSetpointC = new Float64Array(hourCount);
  for (let hour = 0; hour < hourCount; hour++) {
    const day = (hour / 24) | 0;
    gainW[hour] = parameters.solarGainAreaM2 * hours.clearnessOfDay[day] * hours.clearSkyGlobalHorizontalWPerM2[hour];
    daySetpointC[hour] = parameters.daySetpointC[day];
    nightSetpointC[hour] = parameters.nightSetpointC[day];
  }
  const uaDay = parameters.uaDayWPerK;
  const uaNight = parameters.uaNightWPerK;
  const skyNight = parameters.skyNightM2;
  const skyDeficit = hours.skyDeficitWPerM2;
  const bareLoop = (): number => {
    let totalWh = 0;
    for (let hour = 0; hour < hourCount; hour++) {
      const t = outdoorC[hour];
      const f = share[hour];
      const dayW = uaDay * (daySetpointC[hour] - t) - gainW[hour];
      const nightW = uaNight * (nightSetpointC[hour] - t) + skyNight * skyDeficit[hour];
      if (dayW > 0) totalWh += f * dayW;
      if (nightW > 0) totalWh += (1 - f) * nightW;
    }
    return totalWh;
  };
  const simulation = (): number => simulateSeason(hours, parameters).totalHeatWh;

  // warm up the JIT
  for (let run = 0; run < 300; run++) {
    bareLoop();
    simulation();
  }
  const bare = medianMs(201, bareLoop, 20);
  const simulated = medianMs(201, simulation, 20);
  const sun = medianMs(
    9,
    () => precomputeSunHours({ latitudeDeg: 42, longitudeDeg: -72.5, utcOffsetHours: -5 }, 2026, ref).hourCount,
  );
  estimateSeason(input, ref, sunCache);
  const whole = medianMs(51, () => estimateSeason(input, ref, sunCache).total.energyKWh);
  const singlePoly = exampleDoublePolyGableHouse({
    coverings: { roof: 'poly-single', sidewalls: 'poly-single', endwalls: 'poly-single' },
  });
  const sideBySideInput = demoSideBySideInput(singlePoly);
  const sideBySide = () =>
    compareSideBySide(sideBySideInput.house, sideBySideInput.alternatives, ref, sunCache).house.season.total.energyKWh;
  sideBySide();
  const fiveColumns = medianMs(21, sideBySide);

  const format = (ms: number) => `${ms.toFixed(3)} ms`;
  console.log(`Season engine benchmark (${hourCount} hours, demo house, median of repeated runs)`);
  console.log(`  hourly-year simulation:            ${format(simulated.medianMs)}`);
  console.log(`  bare loop, same arithmetic:        ${format(bare.medianMs)}`);
  console.log(`  ratio simulation / bare loop:      ${(simulated.medianMs / bare.medianMs).toFixed(2)}×`);
  console.log(`  sun positions for a site-year:     ${format(sun.medianMs)}`);
  console.log(`  whole estimateSeason (sun cached): ${format(whole.medianMs)}`);
  console.log(
    `  side-by-side, house + 4 alternatives (heating, cooling, season each): ${format(fiveColumns.medianMs)}`,
  );
  // keep the results alive so no loop is optimised away
  if (!Number.isFinite(bare.sink + simulated.sink + sun.sink + whole.sink + fiveColumns.sink))
    console.log('non-finite result');
}

main();
benchReportPdf()
  .then(({ medianMs, bytes, pages }) =>
    console.log(
      `  report PDF render (demo house):     ${medianMs.toFixed(1)} ms (${pages} pages, ${Math.round(bytes / 1024)} kB)`,
    ),
  )
  .catch((error: Error) => {
    console.error(`report PDF benchmark failed: ${error.message}`);
    process.exitCode = 1;
  });
