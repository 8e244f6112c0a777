/**
 * What an alternative changes, in the grower's words: the API names changed fields by their paths
 * in the house (`coverings.roof`, `setpoints.nightHeatingC`), which never reach a reader as such.
 * The UI's alternatives and side-by-side and the server-built report all write them from here.
 */
const FIELD_WORDS: Record<string, string> = {
  name: 'name',
  notes: 'notes',
  shape: 'shape',
  spans: 'number of spans',
  widthM: 'width',
  lengthM: 'length',
  eaveHeightM: 'eave height',
  ridgeHeightM: 'ridge height',
  'coverings.roof': 'roof covering',
  'coverings.sidewalls': 'sidewall covering',
  'coverings.endwalls': 'endwall covering',
  'coveringUOverridesWPerM2K.roof': 'roof U-value',
  'coveringUOverridesWPerM2K.sidewalls': 'sidewall U-value',
  'coveringUOverridesWPerM2K.endwalls': 'endwall U-value',
  coveringUOverridesWPerM2K: 'covering U-values',
  airLeakageClassId: 'air leakage class',
  airChangesPerHourOverride: 'air changes per hour',
  perimeterInsulated: 'perimeter insulation',
  kneewallHeightM: 'kneewall height',
  kneewallId: 'kneewall',
  curtainId: 'curtain',
  shadeCloth: 'shade cloth',
  'shadeCloth.solarTransmittance': 'shade cloth',
  'shadeCloth.months': 'months the shade cloth is up',
  heaters: 'heaters',
  exhaustFans: 'exhaust fans',
  'exhaustFans.count': 'number of fans',
  'exhaustFans.capacityEachM3PerS': 'fan capacity',
  inletAreaM2: 'inlet area',
  setpoints: 'setpoints',
  'setpoints.dayHeatingC': 'day heating setpoint',
  'setpoints.nightHeatingC': 'night heating setpoint',
  'setpoints.coolingC': 'cooling setpoint',
  calendar: 'production calendar',
  lamps: 'supplemental lamps',
  'lamps.lampTypeId': 'lamp type',
  'lamps.powerDensityWPerM2': 'lamp power',
  'lamps.hoursPerDayByMonth': 'lamp hours',
  'lamps.heatToHouseFraction': 'share of lamp heat kept in the house',
};

/** The lamp values an added set of lamps always states: all of them changed reads "supplemental lamps". */
const LAMP_VALUE_PATHS = ['lamps.powerDensityWPerM2', 'lamps.hoursPerDayByMonth', 'lamps.heatToHouseFraction'];

/** "coverings.roof" → "roof covering"; an unknown path is spelt out word by word, units dropped. */
export function changedFieldWords(path: string): string {
  const withoutIndexes = path.replace(/\[\d+\]|\.\d+/g, '');
  const known = FIELD_WORDS[path] ?? FIELD_WORDS[withoutIndexes] ?? FIELD_WORDS[withoutIndexes.split('.')[0] ?? ''];
  if (known) return known;
  const last = path.split('.').pop() ?? path;
  return last
    .replace(/(M|M2|M3|C|K|W|Pct|WPerM2K|M3PerS|Id)$/, '')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase();
}

/** Words that say less than another word in the same sentence: the cloth's months when the cloth itself changes. */
const COVERED_BY: Record<string, string> = { 'months the shade cloth is up': 'shade cloth' };

/**
 * "Changes roof covering, sidewall covering", each field once. Lamps added (or replaced whole)
 * read as "supplemental lamps" rather than each of their values; the cloth's months are not named
 * beside the cloth itself.
 */
export function changesSentence(paths: string[]): string {
  if (paths.length === 0) return 'No field changes';
  const wholeLamps = LAMP_VALUE_PATHS.every((path) => paths.includes(path));
  const named = wholeLamps ? paths.map((path) => (path.startsWith('lamps.') ? 'lamps' : path)) : paths;
  const words = new Set(named.map(changedFieldWords));
  for (const [narrow, wide] of Object.entries(COVERED_BY)) if (words.has(wide)) words.delete(narrow);
  return `Changes ${[...words].join(', ')}`;
}

/**
 * What an alternative changes, for a column heading or a cell: its changed fields and, when it
 * brings its own production calendar, that too; "No field changes" when it changes nothing.
 */
export function alternativeChangesSentence(changedFields: string[], ownCalendar: boolean): string {
  return changesSentence([...changedFields, ...(ownCalendar ? ['calendar'] : [])]);
}
