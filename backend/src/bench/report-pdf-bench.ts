import { estimateHeating } from '@thermbay/engine/estimate-heating';
import { estimateSeason } from '@thermbay/engine/estimate-season';
import { demoSeasonInput } from '@thermbay/engine/season/demo-season';
import { SunCache } from '@thermbay/engine/season/sun-hours';
import type { HouseDto } from '../houses/dto/house.dto';
import { loadReferenceData } from '../reference-data/load-reference-data';
import { buildReportDocument } from '../reports/report-document';
import { renderReportPdf } from '../reports/report-pdf';
import type { ReportSnapshot } from '../reports/report-snapshot';

/** A report snapshot of the engine's demo house, built the way the reports service builds one. */
function demoSnapshot(): ReportSnapshot {
  const ref = loadReferenceData();
  const input = demoSeasonInput();
  const conditionsUsed = {
    designOutdoorC: -20,
    elevationM: input.site.elevationM,
    insideRelativeHumidityPct: 85,
    insideC: input.house.setpoints.nightHeatingC,
    curtainClosed: false,
  };
  const heating = estimateHeating({ house: input.house, conditions: conditionsUsed }, ref);
  const season = estimateSeason(input, ref, new SunCache());
  return JSON.parse(
    JSON.stringify({
      version: 1,
      takenAt: '2026-12-01T12:00:00.000Z',
      farm: {
        id: 1,
        name: 'Bench farm (invented)',
        latitudeDeg: 42,
        longitudeDeg: -72.5,
        elevationM: 60,
        timeZone: 'America/New_York',
      },
      house: { ...input.house, id: 1, farmId: 1, name: 'Bench house', notes: null } as unknown as HouseDto,
      climate: null,
      heating: {
        ...heating,
        houseId: 1,
        conditionsUsed,
        conditionsSource: {
          designOutdoorC: 'request',
          elevationM: 'farm',
          insideRelativeHumidityPct: 'reference data',
          insideC: 'house night setpoint',
          curtainClosed: 'default',
        },
      },
      season: { status: 'estimated', estimate: { ...season, inputsUsed: null } },
    }),
  ) as ReportSnapshot;
}

/** Median time to render the demo report as PDF (document building included), in ms. */
export async function benchReportPdf(runs = 15): Promise<{ medianMs: number; bytes: number; pages: string }> {
  const snapshot = demoSnapshot();
  const meta = {
    title: 'Heater sizing (bench)',
    notes: 'Bench notes.',
    recommendations: 'Bench recommendations.',
    authorName: 'Bench',
    status: 'draft' as const,
    revision: 1,
    createdAt: new Date('2026-12-01T12:00:00Z'),
    issuedAt: null,
  };
  await renderReportPdf(buildReportDocument(snapshot, meta, 'us')); // warm up fonts and code
  const times: number[] = [];
  let pdf: Buffer = Buffer.alloc(0);
  for (let run = 0; run < runs; run++) {
    const start = process.hrtime.bigint();
    pdf = await renderReportPdf(buildReportDocument(snapshot, meta, run % 2 ? 'si' : 'us'));
    times.push(Number(process.hrtime.bigint() - start) / 1e6);
  }
  times.sort((a, b) => a - b);
  const pages = /\/Type \/Pages[^>]*\/Count (\d+)/.exec(pdf.toString('latin1'))?.[1] ?? '?';
  return { medianMs: times[Math.floor(times.length / 2)]!, bytes: pdf.length, pages };
}
