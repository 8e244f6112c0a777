/**
 * The one registry of TanStack Query keys. Every query and every invalidation names its key
 * here, so a feature that must refresh another's results (a new fuel price refreshes every season
 * result, a climate change every estimate) does so by name, never by a string literal that can
 * drift. Keys are hierarchical: invalidating a prefix (`seasonKeys.all`) refreshes all below it.
 * Request objects are part of keys as plain data; their types live with their features.
 */

type UnitSystemKey = string | undefined;

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  demoAccounts: () => [...authKeys.all, 'demo-accounts'] as const,
};

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
};

export const referenceDataKeys = {
  all: ['reference-data'] as const,
};

export const farmKeys = {
  all: ['farms'] as const,
  lists: () => [...farmKeys.all, 'list'] as const,
  details: () => [...farmKeys.all, 'detail'] as const,
  detail: (farmId: number) => [...farmKeys.details(), farmId] as const,
};

export const memberKeys = {
  all: ['members'] as const,
  farm: (farmId: number) => [...memberKeys.all, 'farm', farmId] as const,
  invitations: (farmId: number) => [...memberKeys.all, 'invitations', farmId] as const,
};

export const invitationKeys = {
  all: ['invitations'] as const,
  preview: (token: string) => [...invitationKeys.all, 'preview', token] as const,
};

export const mailKeys = {
  all: ['mail'] as const,
  outbox: () => [...mailKeys.all, 'outbox'] as const,
  inbox: () => [...mailKeys.all, 'inbox'] as const,
};

export const houseKeys = {
  all: ['houses'] as const,
  lists: () => [...houseKeys.all, 'list'] as const,
  list: (farmId: number) => [...houseKeys.lists(), { farmId }] as const,
  details: () => [...houseKeys.all, 'detail'] as const,
  detail: (houseId: number) => [...houseKeys.details(), houseId] as const,
};

/** Design-night and design-day estimates; `estimateKeys.all` refreshes both after a climate change. */
export const estimateKeys = {
  all: ['estimates'] as const,
};

export const heatingEstimateKeys = {
  all: [...estimateKeys.all, 'heating'] as const,
  house: (houseId: number) => [...heatingEstimateKeys.all, houseId] as const,
  stored: (houseId: number, storedVersion: string, conditions: object) =>
    [...heatingEstimateKeys.house(houseId), 'stored', storedVersion, conditions] as const,
  edited: (houseId: number, spec: object, conditions: object) =>
    [...heatingEstimateKeys.house(houseId), 'edited', { spec, conditions }] as const,
};

export const coolingEstimateKeys = {
  all: [...estimateKeys.all, 'cooling'] as const,
  house: (houseId: number) => [...coolingEstimateKeys.all, houseId] as const,
  stored: (houseId: number, storedVersion: string, conditions: object) =>
    [...coolingEstimateKeys.house(houseId), 'stored', storedVersion, conditions] as const,
  edited: (houseId: number, spec: object, site: object, conditions: object) =>
    [...coolingEstimateKeys.house(houseId), 'edited', { spec, site, conditions }] as const,
};

/** Everything computed over a season (house seasons, measures, the farm budget): refreshed by `seasonKeys.all`. */
export const seasonKeys = {
  all: ['season'] as const,
  house: (houseId: number) => [...seasonKeys.all, 'house', houseId] as const,
  estimate: (houseId: number, request: object) => [...seasonKeys.house(houseId), 'estimate', request] as const,
  night: (houseId: number, request: object) => [...seasonKeys.house(houseId), 'night', request] as const,
  calendar: (houseId: number) => [...seasonKeys.house(houseId), 'calendar'] as const,
  measures: (houseId: number, request: object) => [...seasonKeys.house(houseId), 'measures', request] as const,
};

/** The measures kept with a house (not a computed result: outside `seasonKeys`). */
export const measurePlanKeys = {
  all: ['measure-plans'] as const,
  house: (houseId: number) => [...measurePlanKeys.all, houseId] as const,
};

export const seasonBudgetKeys = {
  all: [...seasonKeys.all, 'budget'] as const,
  farm: (farmId: number, request: object) => [...seasonBudgetKeys.all, farmId, request] as const,
};

export const fuelPriceKeys = {
  all: ['fuel-prices'] as const,
  farm: (farmId: number) => [...fuelPriceKeys.all, 'farm', farmId] as const,
};

export const climateKeys = {
  all: ['climate'] as const,
  farm: (farmId: number) => [...climateKeys.all, 'farm', farmId] as const,
};

export const weatherKeys = {
  all: ['weather'] as const,
  source: (farmId: number) => [...weatherKeys.all, 'source', farmId] as const,
};

export const temperatureLogKeys = {
  all: ['temperature-logs'] as const,
  farm: (farmId: number) => [...temperatureLogKeys.all, 'farm', farmId] as const,
  detail: (logId: number) => [...temperatureLogKeys.all, 'detail', logId] as const,
};

export const alternativeKeys = {
  all: ['alternatives'] as const,
  list: (houseId: number) => [...alternativeKeys.all, 'list', houseId] as const,
  sideBySide: (houseId: number, version: string, request: object) =>
    [...alternativeKeys.all, 'side-by-side', houseId, version, request] as const,
};

/** A farm's fuel bills and the calibrations run against them. */
export const calibrationKeys = {
  all: ['calibration'] as const,
  records: (farmId: number) => [...calibrationKeys.all, 'records', farmId] as const,
  calibrations: (farmId: number) => [...calibrationKeys.all, 'runs', farmId] as const,
};

export const reportKeys = {
  all: ['reports'] as const,
  house: (houseId: number) => [...reportKeys.all, 'house', houseId] as const,
  farm: (farmId: number) => [...reportKeys.all, 'farm', farmId] as const,
  /** the server writes the document in the reader's units, so the unit system is part of the key */
  detail: (reportId: number, unitSystem: UnitSystemKey) => [...reportKeys.all, 'detail', reportId, unitSystem] as const,
  advising: () => [...reportKeys.all, 'advising'] as const,
};
