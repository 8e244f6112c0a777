/**
 * Speed of turning years of hourly weather history into a farm's climate (run: npm run bench).
 * Ten years of the stand-in's invented hours at the demo site are made first (not timed); then the
 * engine's climateFromHourlyWeather runs on them. Prints the median time and the memory the hours
 * and the computation need; no assertions.
 */
import { climateFromHourlyWeather, type HourlyWeatherSpan } from '@thermbay/engine/climate/hourly-climate';
import { loadReferenceData } from '../reference-data/load-reference-data';
import { inventHourlyWeather } from '../weather/stand-in/invented-weather';

function main(): void {
  const ref = loadReferenceData();
  const site = { latitudeDeg: 45.55, longitudeDeg: -94.16, elevationM: 320, utcOffsetHours: -6 };
  const heapBefore = process.memoryUsage().heapUsed;
  const spans: HourlyWeatherSpan[] = [];
  for (let year = 2016; year <= 2025; year++) {
    const start = Date.UTC(year, 0, 1);
    const hours = (Date.UTC(year + 1, 0, 1) - start) / 3_600_000;
    const invented = inventHourlyWeather(site.latitudeDeg, site.longitudeDeg, site.elevationM, start, hours, ref);
    spans.push({
      year,
      startUtcMs: start,
      dryBulbC: invented.temperatureC,
      dewPointC: invented.dewPointC,
      globalHorizontalWPerM2: invented.globalHorizontalWPerM2,
    });
  }
  const heapWithHours = process.memoryUsage().heapUsed;
  const hourCount = spans.reduce((sum, span) => sum + span.dryBulbC.length, 0);

  climateFromHourlyWeather(spans, site, ref); // warm up
  const times: number[] = [];
  let sink = 0;
  let peakHeap = 0;
  for (let run = 0; run < 7; run++) {
    const start = process.hrtime.bigint();
    sink += climateFromHourlyWeather(spans, site, ref).winterDesign996C;
    times.push(Number(process.hrtime.bigint() - start) / 1e6);
    peakHeap = Math.max(peakHeap, process.memoryUsage().heapUsed);
  }
  times.sort((a, b) => a - b);
  const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;
  console.log(`Climate from hourly history benchmark (${hourCount.toLocaleString('en-US')} hours = 10 years)`);
  console.log(`  climateFromHourlyWeather, median of 7: ${times[3]!.toFixed(1)} ms (aim: under 200 ms)`);
  console.log(`  heap for the hours as JS arrays:        ${mb(heapWithHours - heapBefore)}`);
  console.log(`  heap at the peak of the runs:           ${mb(peakHeap)}; resident ${mb(process.memoryUsage().rss)}`);
  if (!Number.isFinite(sink)) console.log('non-finite result');
}

main();
