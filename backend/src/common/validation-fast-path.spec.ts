import 'reflect-metadata';
import { plainToInstance } from 'class-transformer';
import { getMetadataStorage, ValidationTypes, validateSync } from 'class-validator';
import fc from 'fast-check';
// every controller, so every request DTO of the API registers its rules
import '../app.module';
import { passesEveryRule } from './validation-fast-path';
import { keepValidationRules } from './validation';

// class-transformer keeps each property's @Type here (as Nest's mapped types read it); the spec
// reads it to build nested bodies
const { defaultMetadataStorage } =
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  require('class-transformer/cjs/storage') as typeof import('class-transformer/types/storage');

type Rule = ReturnType<ReturnType<typeof getMetadataStorage>['getTargetValidationMetadatas']>[number];
type Class = new () => object;

/** The options Nest's ValidationPipe hands class-validator with the API's settings. */
const PIPE_OPTIONS = {
  forbidUnknownValues: false,
  whitelist: true,
  forbidNonWhitelisted: true,
  validationError: { target: false },
};

const storage = getMetadataStorage();
const classes = [...(storage as unknown as { validationMetadatas: Map<unknown, Rule[]> }).validationMetadatas.keys()]
  .filter((target): target is Class => typeof target === 'function')
  .sort((a, b) => a.name.localeCompare(b.name));

function rulesOf(target: Class): Record<string, Rule[]> {
  return storage.groupByPropertyName(storage.getTargetValidationMetadatas(target, '', false, false));
}

const constraintName = (rule: Rule) =>
  rule.name ?? storage.getTargetValidatorConstraints(rule.constraintCls)[0]?.name ?? '';

/**
 * Values a property is likely to accept, read from its rules (bounds, allowed values, lengths),
 * and values of every other kind, so that bodies come out valid often enough and invalid in
 * every way: wrong types, out of range, null, missing, unknown fields, wrong nesting.
 */
function valuesFor(rules: Rule[]): { likely: unknown[]; any: unknown[] } {
  const named = (name: string) => rules.filter((rule) => constraintName(rule) === name);
  const likely: unknown[] = [];
  const number = (value: number) => (named('isInt').length > 0 ? Math.round(value) : value);
  const min = named('min')[0]?.constraints[0] as number | undefined;
  const max = named('max')[0]?.constraints[0] as number | undefined;
  if (named('isNumber').length > 0 || named('isInt').length > 0 || min !== undefined || max !== undefined) {
    const low = min ?? (max !== undefined ? max - 10 : 0);
    const high = max ?? low + 10;
    likely.push(number(low), number(high), number((low + high) / 2), number(low + (high - low) / 3));
  }
  for (const rule of named('isIn')) likely.push(...(rule.constraints[0] as unknown[]));
  for (const rule of [...named('isLength'), ...named('maxLength'), ...named('minLength')]) {
    const lengths = rule.constraints.filter((value): value is number => typeof value === 'number');
    for (const length of lengths) likely.push('x'.repeat(length), 'x'.repeat(Math.max(1, length - 1)));
  }
  if (named('isString').length > 0 && likely.length === 0) likely.push('a', 'Greenhouse 1');
  if (named('isBoolean').length > 0) likely.push(true, false);
  if (named('isCalendarDate').length > 0) likely.push('2026-07-21', '2027-01-31');
  if (named('isEmail').length > 0) likely.push('grower@example.com');
  if (named('ianaTimeZone').length > 0) likely.push('America/New_York', 'UTC');
  if (named('currencyCode').length > 0) likely.push('USD', 'EUR');
  const any = [0, -1, 1.5, 1e9, '', 'a', 'x'.repeat(300), '2026-02-30', true, null, [], {}, [1], ['a', 'a'], 'USD'];
  let values = likely.length > 0 ? likely : any;
  if (named('isArray').length > 0) {
    // a list of such values: empty, one, several (repeated too), and one of the wrong kind among them
    const size = (named('arrayMinSize')[0]?.constraints[0] as number | undefined) ?? 1;
    values = [
      [],
      values.slice(0, 1),
      Array.from({ length: size }, (_, index) => values[index % values.length]),
      Array.from({ length: size }, (_, index) => values[(index + 1) % values.length]),
      [...values.slice(0, Math.max(0, size - 1)), typeof values[0] === 'string' ? 1 : 'a'],
    ];
  }
  if (rules.some((rule) => rule.type === ValidationTypes.CONDITIONAL_VALIDATION)) values.push(undefined, null);
  return { likely: values, any: [...any, undefined] };
}

function arbitraryFor(target: Class, depth: number): fc.Arbitrary<Record<string, unknown>> {
  const byProperty = rulesOf(target);
  const fields: Record<string, fc.Arbitrary<unknown>> = {};
  for (const [property, rules] of Object.entries(byProperty)) {
    const { likely, any } = valuesFor(rules);
    const type = defaultMetadataStorage.findTypeMetadata(target, property)?.typeFunction() as Class | undefined;
    const nested =
      type && depth < 4 && rules.some((rule) => rule.type === ValidationTypes.NESTED_VALIDATION)
        ? arbitraryFor(type, depth + 1)
        : null;
    const isArray = rules.some((rule) => constraintName(rule) === 'isArray' || rule.each);
    fields[property] = fc.oneof(
      nested
        ? { weight: 60, arbitrary: isArray ? fc.array(nested, { maxLength: 3 }) : (nested as fc.Arbitrary<unknown>) }
        : { weight: 60, arbitrary: fc.constantFrom(...likely) },
      { weight: 1, arbitrary: fc.constantFrom(...any) },
    );
  }
  return fc
    .tuple(
      fc.record(fields),
      fc.oneof({ weight: 20, arbitrary: fc.constant(null) }, { weight: 1, arbitrary: fc.constantFrom('extra', 'id') }),
    )
    .map(([body, extra]) => {
      const plain: Record<string, unknown> = {};
      for (const [key, value] of Object.entries(body)) if (value !== undefined) plain[key] = value;
      if (extra) plain[extra] = 'x';
      return plain;
    });
}

/** class-validator's verdict, the reference the fast path must match. */
const classValidatorPasses = (instance: object) => validateSync(instance, PIPE_OPTIONS).length === 0;

describe('passesEveryRule', () => {
  beforeAll(() => keepValidationRules());

  it('reads the rules of every request class of the API', () => {
    expect(classes.length).toBeGreaterThan(40);
    expect(classes.map((target) => target.name)).toEqual(
      expect.arrayContaining(['HeatingEstimateRequestDto', 'HouseSpecDto', 'CreateHouseDto']),
    );
  });

  it.each(classes.map((target) => [target.name, target] as const))(
    '%s: passes exactly the bodies class-validator passes',
    (_name, target) => {
      let passed = 0;
      fc.assert(
        fc.property(arbitraryFor(target, 0), (plain) => {
          const instance = plainToInstance(target, plain);
          const expected = classValidatorPasses(instance);
          if (expected) passed++;

          expect(passesEveryRule(instance, PIPE_OPTIONS)).toBe(expected);
        }),
        { numRuns: 200, seed: 20261202 },
      );
      if (process.env.SHOW_PASSED) console.log(target.name, passed);
      // the generated bodies reach both answers for the classes behind the busiest routes
      if (['HeatingEstimateRequestDto', 'HouseSpecDto', 'CoolingEstimateRequestDto'].includes(target.name)) {
        expect(passed).toBeGreaterThan(0);
      }
    },
  );

  it('passes a design-night body and refuses one field out of bounds, an unknown field, a wrong nesting', () => {
    // the bench's house, as in test/fixtures.ts
    const house = {
      shape: 'gable',
      spans: 1,
      widthM: 9,
      lengthM: 30,
      eaveHeightM: 2.5,
      ridgeHeightM: 4.5,
      coverings: {
        roof: 'poly-double-inflated',
        sidewalls: 'poly-double-inflated',
        endwalls: 'polycarbonate-twin-8mm',
      },
      airLeakageClassId: 'new-film-double',
      perimeterInsulated: false,
      curtainId: null,
      heaters: [{ count: 2, ratedInputW: 50_000, efficiency: 0.8, fuelId: 'propane' }],
      exhaustFans: { count: 2, capacityEachM3PerS: 5 },
      inletAreaM2: 3,
      setpoints: { dayHeatingC: 18, nightHeatingC: 15, coolingC: 25 },
    };
    const conditions = { designOutdoorC: -20, elevationM: 0, insideRelativeHumidityPct: 80 };
    const target = classes.find((type) => type.name === 'HeatingEstimateRequestDto')!;
    const check = (plain: object) => passesEveryRule(plainToInstance(target, plain), PIPE_OPTIONS);
    expect(check({ house, conditions })).toBe(true);
    expect(check({ house: { ...house, widthM: 500 }, conditions })).toBe(false);
    expect(check({ house, conditions, extra: 1 })).toBe(false);
    expect(check({ house: { ...house, heaters: [{ ...house.heaters[0], colour: 'red' }] }, conditions })).toBe(false);
    expect(check({ house: { ...house, setpoints: 'warm' }, conditions })).toBe(false);
    expect(check({ house: { ...house, heaters: ['x'] }, conditions })).toBe(false);
    expect(check({ house, conditions: { ...conditions, insideC: null } })).toBe(false);
  });

  it('refuses an object of a class without rules as class-validator does, unless told not to', () => {
    class Bare {}
    for (const options of [{ whitelist: true, forbidNonWhitelisted: true }, PIPE_OPTIONS]) {
      const expected = validateSync(new Bare(), options).length === 0;
      expect(passesEveryRule(new Bare(), options)).toBe(expected);
    }
    expect(passesEveryRule(new Bare(), { whitelist: true, forbidNonWhitelisted: true })).toBe(false);
    expect(passesEveryRule(new Bare(), PIPE_OPTIONS)).toBe(true);
  });

  it('leaves options it does not handle to class-validator', () => {
    const target = classes.find((type) => type.name === 'HeatingEstimateRequestDto')!;
    const instance = plainToInstance(target, {});
    expect(passesEveryRule(instance, { ...PIPE_OPTIONS, groups: ['x'] })).toBe(false);
    expect(passesEveryRule(instance, { ...PIPE_OPTIONS, skipMissingProperties: true })).toBe(false);
    expect(passesEveryRule(instance, { whitelist: true, forbidNonWhitelisted: false })).toBe(false);
  });
});
