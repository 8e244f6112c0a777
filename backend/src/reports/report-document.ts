import type { ReportSnapshot } from './report-snapshot';
import { DEFAULT_CURRENCY } from '@thermbay/engine/vocabulary';
import { formatMoney } from '../common/money';
import { format, formatNumber, prose, unitLabel, convert, type ReportQuantity, type UnitSystem } from './report-units';
import { quantityOfSiUnit } from '@thermbay/engine/vocabulary';
import { alternativeCautions, alternativesSection } from './report-alternatives';

/**
 * The report as a document in the reader's units: headed sections of paragraphs, fact lists,
 * tables, bullet lists and one bar chart. The web page and the PDF both draw this, so they say
 * the same thing.
 */
export interface ReportBlock {
  kind: 'paragraph' | 'facts' | 'table' | 'list' | 'bars';
  text?: string;
  facts?: Array<{ label: string; value: string }>;
  columns?: string[];
  rows?: string[][];
  items?: string[];
  caption?: string;
  /** bars: values in `unit` */
  bars?: Array<{ label: string; value: number }>;
  unit?: string;
  /**
   * table: a comparison, whose first cell in each row names the row and whose other columns share
   * the width equally (drawn whole at the page's width, in print too)
   */
  comparison?: boolean;
}

export interface ReportSection {
  heading: string;
  blocks: ReportBlock[];
}

export interface ReportDocument {
  unitSystem: UnitSystem;
  pageSize: 'A4' | 'LETTER';
  farmName: string;
  houseName: string;
  title: string;
  subtitle: string;
  sections: ReportSection[];
  footer: string;
}

export interface ReportMeta {
  title: string;
  notes: string;
  recommendations: string;
  authorName: string;
  status: 'draft' | 'issued';
  revision: number;
  createdAt: Date;
  issuedAt: Date | null;
}

export const PLANNING_FOOTER =
  'Planning estimates from standard handbook methods and the values listed under Assumptions. They are not an ' +
  'engineering design: heater selection, venting and installation belong to licensed installers working to local codes.';

/** The cautions every heater-sizing report carries, whatever the engine added. */
export const STANDING_CAUTIONS = [
  'Combustion air: every fuel-fired heater needs a fresh-air inlet sized for its input; a tight house starves burners.',
  'Venting: vent every fuel-fired heater to the outside through a sound flue, and check flues before each season.',
  'Carbon monoxide: a faulty, unvented or back-drafting heater can kill people. Fit carbon monoxide alarms.',
  'Ethylene injury: incomplete combustion releases ethylene, which injures sensitive crops at very low concentrations.',
  'Installation: have heaters, gas lines and electrical work sized, installed and serviced by licensed installers under local codes.',
];

function assumptionValue(value: number | string, unit: string, system: UnitSystem): string {
  if (typeof value === 'string') return unit ? `${value} ${unit}` : value;
  const kind = quantityOfSiUnit(unit);
  if (kind) return format(kind, value, system);
  if (unit === 'fraction') return `${formatNumber(value * 100, 0)} %`;
  const decimals = Math.abs(value) >= 100 ? 0 : Math.abs(value) >= 1 ? 2 : 3;
  return `${formatNumber(value, decimals)}${unit && unit !== '–' ? ` ${unit}` : ''}`;
}

const CONFIDENCE_WORDS: Record<string, string> = {
  verified: 'verified in the source',
  'verified-secondary': 'verified in a copy or quotation',
  derived: 'derived from sourced values',
  memory: 'recalled, treat as a range until checked',
  'common-practice': 'trade rule of thumb',
  'user-entered': 'entered for this house',
};

const SHAPE_WORDS: Record<string, string> = { gable: 'gable', 'gothic-arch': 'gothic arch', quonset: 'quonset' };

const VERDICT_WORDS: Record<string, string> = {
  adequate: 'Adequate: the installed heaters hold the setpoint on the design night',
  short: 'Short: the installed heaters do not hold the setpoint on the design night',
  'none-installed': 'No heaters are entered for this house',
};

function paragraphs(text: string): ReportBlock[] {
  return text
    .split(/\n{2,}/)
    .map((p) => p.trim())
    .filter(Boolean)
    .map((p) => ({ kind: 'paragraph' as const, text: p }));
}

export function buildReportDocument(snapshot: ReportSnapshot, meta: ReportMeta, system: UnitSystem): ReportDocument {
  const { farm, house, heating } = snapshot;
  const currency = farm.currency ?? DEFAULT_CURRENCY;
  const f = (kind: ReportQuantity, value: number | null | undefined) => format(kind, value, system);
  const sections: ReportSection[] = [];

  sections.push({
    heading: 'House and site',
    blocks: [
      {
        kind: 'facts',
        facts: [
          { label: 'Farm', value: farm.name },
          {
            label: 'Site',
            value: `${formatNumber(farm.latitudeDeg, 3)}°, ${formatNumber(farm.longitudeDeg, 3)}°; elevation ${f('length', farm.elevationM)}`,
          },
          { label: 'House', value: house.name },
          {
            label: 'Shape',
            value: `${SHAPE_WORDS[house.shape] ?? house.shape}, ${house.spans} span${house.spans === 1 ? '' : 's'}, ${f('length', house.widthM)} wide × ${f('length', house.lengthM)} long`,
          },
          {
            label: 'Heights',
            value: `eave ${f('length', house.eaveHeightM)}, ridge ${f('length', house.ridgeHeightM)}`,
          },
          {
            label: 'Size',
            value: `floor ${f('area', heating.geometry.floorAreaM2)}, cover ${f('area', heating.geometry.coverAreaM2)}, volume ${f('volume', heating.geometry.volumeM3)}`,
          },
          {
            label: 'Coverings',
            value: `roof ${house.coverings.roof}, sidewalls ${house.coverings.sidewalls}, endwalls ${house.coverings.endwalls}`,
          },
          { label: 'Air leakage class', value: house.airLeakageClassId },
          {
            label: 'Heaters',
            value:
              house.heaters.length === 0
                ? 'none entered'
                : house.heaters
                    .map(
                      (h) =>
                        `${h.count} × ${f('power', h.ratedInputW)} input, ${formatNumber(h.efficiency * 100, 0)} % efficient (${h.fuelId})`,
                    )
                    .join('; '),
          },
        ],
      },
    ],
  });

  const c = heating.conditionsUsed;
  const s = heating.conditionsSource;
  sections.push({
    heading: 'Design conditions',
    blocks: [
      {
        kind: 'table',
        columns: ['Condition', 'Value', 'From'],
        rows: [
          ['Outdoor design temperature', f('temperature', c.designOutdoorC), s.designOutdoorC],
          ['Inside temperature held', f('temperature', c.insideC), s.insideC],
          [
            'Inside relative humidity',
            `${formatNumber(c.insideRelativeHumidityPct, 0)} %`,
            s.insideRelativeHumidityPct,
          ],
          ['Site elevation', f('length', c.elevationM), s.elevationM],
          ['Curtain', c.curtainClosed ? 'closed (credited)' : 'open (not credited)', s.curtainClosed],
        ],
      },
      ...(snapshot.climate?.sourceNote
        ? [{ kind: 'paragraph' as const, text: `Farm climate source: ${snapshot.climate.sourceNote}` }]
        : []),
    ],
  });

  const loss = heating.heatLoss;
  const powerUnit = unitLabel('power', system);
  sections.push({
    heading: 'Heat loss on the design night',
    blocks: [
      {
        kind: 'paragraph',
        text: `Inside ${f('temperature', loss.insideC)}, outside ${f('temperature', loss.outsideC)} (difference ${f('temperatureDifference', loss.deltaTK)}): total heat loss ${f('power', loss.totalW)}.`,
      },
      {
        kind: 'table',
        columns: ['Part', 'Size', 'Coefficient', `Heat loss (${powerUnit})`, 'Share'],
        rows: loss.components.map((part) => [
          part.label,
          part.quantityUnit === 'm2'
            ? f('area', part.quantity)
            : part.quantityUnit === 'm'
              ? f('length', part.quantity)
              : f('volume', part.quantity),
          part.key === 'infiltration'
            ? `${formatNumber(part.coefficient, 2)} air changes/h`
            : part.key === 'perimeter'
              ? f('perimeterFactor', part.coefficient)
              : f('uValue', part.coefficient),
          formatNumber(convert('power', part.watts, system), system === 'si' ? 1 : 0),
          `${formatNumber(part.share * 100, 0)} %`,
        ]),
      },
      {
        kind: 'bars',
        caption: 'Heat loss by part on the design night',
        unit: powerUnit,
        bars: loss.components.map((part) => ({
          label: part.label,
          value: Number(convert('power', part.watts, system).toFixed(system === 'si' ? 2 : 0)),
        })),
      },
    ],
  });

  const h = heating.heater;
  sections.push({
    heading: 'Heater output: required against installed',
    blocks: [
      {
        kind: 'facts',
        facts: [
          {
            label: 'Required output',
            value: `${f('power', h.requiredOutputW)} (design loss + ${formatNumber(h.safetyMargin * 100, 0)} % margin)`,
          },
          { label: 'Required input', value: f('power', h.requiredInputW) },
          {
            label: 'Installed output',
            value: `${f('power', h.installedOutputW)} from ${h.unitCount} unit${h.unitCount === 1 ? '' : 's'}`,
          },
          { label: 'Verdict', value: VERDICT_WORDS[h.verdict] ?? h.verdict },
          ...(h.shortfallW > 0 ? [{ label: 'Shortfall', value: f('power', h.shortfallW) }] : []),
          { label: 'Lowest outdoor temperature held', value: f('temperature', h.lowestHeldOutdoorC) },
          {
            label: 'With the largest unit out',
            value:
              h.holdsWithLargestUnitOutC === null
                ? 'only one unit: no heat at all'
                : f('temperature', h.holdsWithLargestUnitOutC),
          },
        ],
      },
      { kind: 'paragraph', text: `Splitting the output: ${prose(h.splitAdvice, system)}` },
    ],
  });

  const cond = heating.condensation;
  sections.push({
    heading: 'Condensation by surface',
    blocks: [
      {
        kind: 'paragraph',
        text: `Inside air ${f('temperature', cond.insideC)} at ${formatNumber(cond.insideRelativeHumidityPct, 0)} % relative humidity: dew point ${f('temperature', cond.dewPointC)}.`,
      },
      {
        kind: 'table',
        columns: ['Surface', 'Covering', 'U-value', 'Inside surface', 'Drips below outdoor', 'On the design night'],
        rows: cond.surfaces.map((surface) => [
          surface.group,
          surface.coveringId,
          f('uValue', surface.uWPerM2K),
          f('temperature', surface.insideSurfaceC),
          f('temperature', surface.condensationBelowOutdoorC),
          surface.condenses ? 'condenses' : 'dry',
        ]),
      },
    ],
  });

  if (snapshot.season.status === 'estimated') {
    const season = snapshot.season.estimate;
    const quantity = system === 'si' ? season.total.fuelQuantitySi : season.total.fuelQuantityUs;
    const fuelUnit = system === 'si' ? season.fuel.unitSi : season.fuel.unitUs;
    sections.push({
      heading: 'Season fuel and cost',
      blocks: [
        {
          kind: 'facts',
          facts: [
            {
              label: 'Season',
              value: `${season.period.startDate} to ${season.period.endDate} (${season.period.heatedDays} heated days)`,
            },
            {
              label: 'Fuel',
              value:
                season.fuel.pricePerUnit === null
                  ? `${season.fuel.label} (no price entered yet)`
                  : `${season.fuel.label} at ${formatMoney(season.fuel.pricePerUnit, currency)} per ${season.fuel.priceUnitLabel}`,
            },
            { label: 'Heat delivered', value: format('energyKWh', season.total.energyKWh, system) },
            { label: 'Fuel burnt', value: `${formatNumber(quantity, 0)} ${fuelUnit}` },
            {
              label: 'Fuel cost',
              value:
                season.total.cost === null
                  ? 'not computed: enter the fuel price on the farm page'
                  : formatMoney(season.total.cost, currency, 0),
            },
          ],
        },
      ],
    });
  } else {
    sections.push({
      heading: 'Season fuel and cost',
      blocks: [{ kind: 'paragraph', text: `Not estimated: ${snapshot.season.reason}` }],
    });
  }

  const alternatives = alternativesSection(snapshot.alternatives, system, currency);
  if (alternatives) sections.push(alternatives);

  const assumptions = [
    ...heating.assumptions,
    ...(snapshot.season.status === 'estimated' ? snapshot.season.estimate.assumptions : []),
  ];
  sections.push({
    heading: 'Assumptions and their sources',
    blocks: [
      {
        kind: 'table',
        columns: ['Assumption', 'Value', 'Source', 'Confidence'],
        rows: assumptions.map((a) => [
          prose(a.label, system),
          a.key === 'fuel-price' && typeof a.value === 'number'
            ? `${formatMoney(a.value, currency)} ${a.unit}`
            : assumptionValue(a.value, a.unit, system),
          a.source,
          CONFIDENCE_WORDS[a.confidence] ?? a.confidence,
        ]),
      },
    ],
  });

  const engineCautions = [
    ...heating.cautions,
    ...(snapshot.season.status === 'estimated' ? snapshot.season.estimate.cautions : []),
  ].map((text) => prose(text, system));
  sections.push({
    heading: 'Safety',
    blocks: [
      {
        kind: 'list',
        items: [
          ...new Set([...engineCautions, ...STANDING_CAUTIONS, ...alternativeCautions(snapshot.alternatives, system)]),
        ],
      },
    ],
  });

  sections.push({
    heading: "Adviser's notes",
    blocks: meta.notes.trim() ? paragraphs(meta.notes) : [{ kind: 'paragraph', text: 'No notes.' }],
  });
  sections.push({
    heading: 'Recommendations',
    blocks: meta.recommendations.trim()
      ? paragraphs(meta.recommendations)
      : [{ kind: 'paragraph', text: 'No recommendations written.' }],
  });

  const date = (meta.issuedAt ?? meta.createdAt).toISOString().slice(0, 10);
  return {
    unitSystem: system,
    pageSize: system === 'us' ? 'LETTER' : 'A4',
    farmName: farm.name,
    houseName: house.name,
    title: meta.title,
    subtitle: `${house.name} · ${meta.status === 'issued' ? 'issued' : 'draft'} revision ${meta.revision} · ${date} · by ${meta.authorName} · inputs as of ${snapshot.takenAt.slice(0, 10)}`,
    sections,
    footer: PLANNING_FOOTER,
  };
}
