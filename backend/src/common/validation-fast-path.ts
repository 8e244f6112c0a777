import {
  getMetadataStorage,
  ValidationTypes,
  type MetadataStorage,
  type ValidationArguments,
  type ValidatorConstraintInterface,
  type ValidatorOptions,
} from 'class-validator';

type Rule = ReturnType<MetadataStorage['getTargetValidationMetadatas']>[number];

/** The options the API's pipe validates with; any other option leaves the decision to class-validator. */
const UNDERSTOOD_OPTIONS = new Set(['whitelist', 'forbidNonWhitelisted', 'forbidUnknownValues', 'validationError']);
const RULE_TYPES = new Set([
  ValidationTypes.CUSTOM_VALIDATION,
  ValidationTypes.NESTED_VALIDATION,
  ValidationTypes.CONDITIONAL_VALIDATION,
  ValidationTypes.WHITELIST,
  ValidationTypes.IS_DEFINED,
]);

const isPromise = (value: unknown): boolean =>
  value !== null && typeof value === 'object' && typeof (value as { then?: unknown }).then === 'function';

/**
 * True only when class-validator would find nothing wrong with `object` (a class instance, as
 * class-transformer built it) under `options`. It walks the same rules, looked up the same way,
 * through the same constraint functions as class-validator's executor, but stops at the first
 * failure and builds no error objects: validating a design estimate's body with class-validator
 * allocated about 80 kB and took a tenth of the request's CPU time, most of it spent on error
 * records for fields that turned out to be fine.
 *
 * False means only "ask class-validator": on any failure, and for whatever this does not handle
 * (validation groups and the options that go with them, asynchronous or promise rules, Sets and
 * Maps, a whitelist that strips instead of refusing). The pipe then runs class-validator, so every
 * error answer is exactly class-validator's.
 */
export function passesEveryRule(
  object: object,
  options: ValidatorOptions = {},
  storage: MetadataStorage = getMetadataStorage(),
): boolean {
  for (const key of Object.keys(options)) if (!UNDERSTOOD_OPTIONS.has(key)) return false;
  const whitelist = options.whitelist === true;
  if (whitelist && options.forbidNonWhitelisted !== true) return false;
  // class-validator refuses an object of a class without rules unless told not to (Nest's pipe does)
  const forbidUnknownValues = options.forbidUnknownValues !== false;
  return new FastPath(storage, whitelist, forbidUnknownValues).objectPasses(object, undefined);
}

/** A rule with the objects that check it (class-validator finds them in its container on every call). */
interface Check {
  rule: Rule;
  validators: ValidatorConstraintInterface[];
}

/** A property's rules sorted as ValidationExecutor sorts them on every call. */
interface PropertyPlan {
  property: string;
  defined: Check[];
  conditions: Rule[];
  custom: Check[];
  nested: Rule[];
}

/**
 * Plans per grouped-rules object (class-validator's groupByPropertyName result), kept while that
 * object lives; null when a rule is of a kind not handled. A constraint's checking object is taken
 * from class-validator's container once (the API sets no container of its own).
 */
const plans = new WeakMap<object, PropertyPlan[] | null>();

function planFor(byProperty: Record<string, Rule[]>, storage: MetadataStorage): PropertyPlan[] | null {
  let plan = plans.get(byProperty);
  if (plan !== undefined) return plan;
  plan = [];
  for (const [property, rules] of Object.entries(byProperty)) {
    if (!rules.every((rule) => RULE_TYPES.has(rule.type))) {
      plan = null;
      break;
    }
    const ofType = (type: string) => rules.filter((rule) => rule.type === type);
    const checks = (type: string) =>
      ofType(type).map((rule) => ({
        rule,
        validators: storage.getTargetValidatorConstraints(rule.constraintCls).map((constraint) => constraint.instance),
      }));
    plan.push({
      property,
      defined: checks(ValidationTypes.IS_DEFINED),
      conditions: ofType(ValidationTypes.CONDITIONAL_VALIDATION),
      custom: checks(ValidationTypes.CUSTOM_VALIDATION),
      nested: ofType(ValidationTypes.NESTED_VALIDATION),
    });
  }
  plans.set(byProperty, plan);
  return plan;
}

/** ValidationExecutor's walk (execute, performValidations, customValidations, nestedValidations), pass or fail only. */
class FastPath {
  constructor(
    private readonly storage: MetadataStorage,
    private readonly whitelist: boolean,
    private readonly forbidUnknownValues: boolean,
  ) {}

  objectPasses(object: object, schema: string | undefined): boolean {
    const rules = this.storage.getTargetValidationMetadatas(object.constructor, schema as string, false, false);
    if (rules.length === 0 && this.forbidUnknownValues) return false;
    const byProperty = this.storage.groupByPropertyName(rules);
    if (this.whitelist) {
      for (const key in object) {
        if (Object.hasOwn(object, key) && !(byProperty[key]?.length > 0)) return false;
      }
    }
    const plan = planFor(byProperty, this.storage);
    if (!plan) return false;
    // as class-validator names it to the constraints (undefined for an object without a constructor)
    const targetName = (object.constructor ? object.constructor.name : undefined) as string;
    for (const { property, defined, conditions, custom, nested } of plan) {
      const value = (object as Record<string, unknown>)[property];
      // every condition is asked, as class-validator asks them, before the answer is read
      let validated = true;
      for (const rule of conditions) {
        if (!(rule.constraints[0] as (o: object, v: unknown) => boolean)(object, value)) validated = false;
      }
      if (!validated) continue;
      if (!customPasses(object, targetName, value, defined)) return false;
      if (!customPasses(object, targetName, value, custom)) return false;
      if (!this.nestedPasses(value, nested)) return false;
    }
    return true;
  }

  private nestedPasses(value: unknown, rules: Rule[]): boolean {
    if (value === undefined) return true;
    for (const rule of rules) {
      if (Array.isArray(value)) {
        // each item as class-validator takes it: no custom rules, the same nested rules
        for (const item of value) if (!this.nestedPasses(item, rules)) return false;
      } else if (value instanceof Set || value instanceof Map) {
        return false;
      } else if (value instanceof Object) {
        const schema = typeof rule.target === 'string' ? rule.target : rule.target.name;
        if (!this.objectPasses(value, schema)) return false;
      } else {
        return false;
      }
    }
    return true;
  }
}

function customPasses(object: object, targetName: string, value: unknown, checks: Check[]): boolean {
  for (const { rule, validators } of checks) {
    if (rule.validateIf && !rule.validateIf(object, value)) continue;
    for (const validator of validators) {
      const args: ValidationArguments = {
        targetName,
        property: rule.propertyName,
        object,
        value,
        constraints: rule.constraints,
      };
      if (!rule.each || !(Array.isArray(value) || value instanceof Set || value instanceof Map)) {
        const valid = validator.validate(value, args);
        if (isPromise(valid) || !valid) return false;
      } else {
        if (!Array.isArray(value)) return false;
        for (const item of value) {
          const valid = validator.validate(item, args);
          if (isPromise(valid) || !valid) return false;
        }
      }
    }
  }
  return true;
}
