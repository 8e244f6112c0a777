/**
 * An alternative of a house is a patch: a JSON object naming only the house fields it changes.
 * Applying it to the house as it is now gives the alternative's house, so a later edit of the
 * house flows into every alternative that does not change that field.
 *
 * Merge rules (JSON Merge Patch, RFC 7386, with one difference at the top level):
 *  - a top-level key is a house field and replaces it (null included: `curtainId: null` = no curtain,
 *    `shadeCloth: null` = no shade cloth; a cloth object where the house has none adds one);
 *  - where both the house field and the patch value are plain objects (coverings, setpoints,
 *    fans, U-value overrides, a shade cloth, lamps …), the patch is merged key by key, recursively
 *    (`shadeCloth: { solarTransmittance: 0.3 }` changes the cloth and keeps its months); a house
 *    without lamps or a cloth (null) takes the patch's whole, and `lamps: null` takes them away;
 *  - inside such an object, null removes the key (e.g. drops one U-value override);
 *  - anything else (numbers, strings, arrays such as the heater groups or the cloth's months)
 *    replaces the whole value.
 */
import { EngineInputError } from '../errors';

export type JsonValue = null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };
export type HousePatch = { [field: string]: JsonValue };

type JsonObject = { [key: string]: JsonValue };

export function isPlainObject(value: unknown): value is JsonObject {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function clone<T>(value: T): T {
  return value === undefined ? value : (JSON.parse(JSON.stringify(value)) as T);
}

export function jsonEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) || Array.isArray(b)) {
    if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
    return a.every((item, i) => jsonEqual(item, b[i]));
  }
  if (isPlainObject(a) && isPlainObject(b)) {
    const keysA = Object.keys(a).filter((k) => a[k] !== undefined);
    const keysB = Object.keys(b).filter((k) => b[k] !== undefined);
    if (keysA.length !== keysB.length) return false;
    return keysA.every((key) => jsonEqual(a[key], b[key]));
  }
  return false;
}

function mergeObject(base: JsonObject, change: JsonObject): JsonObject {
  const result = clone(base);
  for (const [key, value] of Object.entries(change)) {
    if (value === null) delete result[key];
    else result[key] = mergeValue(base[key], value);
  }
  return result;
}

function mergeValue(base: unknown, change: JsonValue): JsonValue {
  if (isPlainObject(change) && isPlainObject(base)) return mergeObject(base, change);
  return clone(change);
}

/**
 * The fields a patch may not touch: who the house is (id, farm, name, notes, timestamps, version).
 * The API passes its own list; these are the defaults.
 */
export const NOT_PATCHABLE_FIELDS: readonly string[] = [
  'id',
  'farmId',
  'name',
  'notes',
  'createdAt',
  'updatedAt',
  'version',
];

/**
 * Throws EngineInputError (`patch.<field>`) when a patch names a field the house does not have, or
 * one that identifies the house rather than describing it. Field names are the house's own, so a
 * field added to houses later is patchable without a change here.
 */
export function assertPatchFields(
  house: object,
  patch: unknown,
  notPatchable: readonly string[] = NOT_PATCHABLE_FIELDS,
): asserts patch is HousePatch {
  if (!isPlainObject(patch)) throw new EngineInputError('patch', 'a patch is an object of house fields');
  for (const key of Object.keys(patch)) {
    if (notPatchable.includes(key)) {
      throw new EngineInputError(`patch.${key}`, `${key} belongs to the house itself and cannot be changed by a patch`);
    }
    if (!(key in house)) throw new EngineInputError(`patch.${key}`, `${key} is not a field of a house`);
  }
}

/** The house with the patch applied. Neither argument is modified. */
export function applyHousePatch<T extends object>(house: T, patch: HousePatch): T {
  const result = clone(house) as Record<string, unknown>;
  const base = house as Record<string, unknown>;
  for (const [key, value] of Object.entries(patch)) result[key] = mergeValue(base[key], value);
  return result as T;
}

function reverseObject(base: JsonObject, change: JsonObject): JsonObject {
  const reverse: JsonObject = {};
  for (const [key, value] of Object.entries(change)) {
    if (!(key in base) || base[key] === undefined) {
      // the patch added a key (or removed one that was not there): removing it restores the house
      if (value !== null) reverse[key] = null;
    } else if (value === null) {
      reverse[key] = clone(base[key]);
    } else {
      reverse[key] = reverseValue(base[key], value);
    }
  }
  return reverse;
}

function reverseValue(base: JsonValue, change: JsonValue): JsonValue {
  if (isPlainObject(change) && isPlainObject(base)) return reverseObject(base, change);
  return clone(base);
}

/**
 * The patch that takes the patched house back to `house`:
 * applyHousePatch(applyHousePatch(house, patch), reverseHousePatch(house, patch)) equals `house`
 * for any house whose object-valued fields hold no null values (stored houses never do).
 */
export function reverseHousePatch(house: object, patch: HousePatch): HousePatch {
  const base = house as JsonObject;
  const reverse: HousePatch = {};
  for (const [key, value] of Object.entries(patch)) reverse[key] = reverseValue(base[key], value);
  return reverse;
}

function diffObject(base: JsonObject, target: JsonObject): JsonObject {
  const patch: JsonObject = {};
  for (const key of Object.keys(base)) {
    if (base[key] !== undefined && (!(key in target) || target[key] === undefined)) patch[key] = null;
  }
  for (const [key, value] of Object.entries(target)) {
    if (value === undefined || jsonEqual(base[key], value)) continue;
    patch[key] =
      isPlainObject(value) && isPlainObject(base[key]) && !hasNull(value)
        ? diffObject(base[key] as JsonObject, value)
        : clone(value);
  }
  return patch;
}

function hasNull(value: JsonObject): boolean {
  return Object.values(value).some((v) => v === null);
}

/**
 * The smallest patch that turns `house` into `target`, over the fields `target` states (fields it
 * leaves out, and those not patchable, are left alone).
 */
export function housePatchBetween(
  house: object,
  target: object,
  notPatchable: readonly string[] = NOT_PATCHABLE_FIELDS,
): HousePatch {
  const base = house as JsonObject;
  const patch: HousePatch = {};
  for (const [key, value] of Object.entries(target as JsonObject)) {
    if (value === undefined || notPatchable.includes(key) || !(key in base)) continue;
    if (jsonEqual(base[key], value)) continue;
    patch[key] = isPlainObject(value) && isPlainObject(base[key]) ? diffObject(base[key], value) : clone(value);
  }
  return patch;
}

/** The dotted paths a patch changes, e.g. ['coverings.roof', 'heaters']. */
export function patchedPaths(patch: HousePatch): string[] {
  const paths: string[] = [];
  const walk = (value: JsonValue, prefix: string, top: boolean) => {
    if (isPlainObject(value) && Object.keys(value).length > 0 && !top) {
      for (const [key, inner] of Object.entries(value)) walk(inner, `${prefix}.${key}`, false);
    } else paths.push(prefix);
  };
  for (const [key, value] of Object.entries(patch)) {
    if (isPlainObject(value) && Object.keys(value).length > 0) {
      for (const [inner, v] of Object.entries(value)) walk(v, `${key}.${inner}`, false);
    } else walk(value, key, true);
  }
  return paths;
}
