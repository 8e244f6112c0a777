import { type ArgumentMetadata, ValidationError, ValidationPipe } from '@nestjs/common';
import {
  getMetadataStorage,
  ValidateBy,
  ValidateIf,
  type MetadataStorage,
  type ValidationOptions,
  type ValidatorOptions,
} from 'class-validator';
import { FieldProblem, RequestValidationException } from './filters/all-exceptions.filter';
import { nulCharacterProblems } from './nul-characters';
import { passesEveryRule } from './validation-fast-path';

/** Class-validator's errors as one problem per field, with dotted paths. */
export function flatten(errors: ValidationError[], parent = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({
      field,
      message: message.replace(error.property, field),
    }));
    return [...own, ...flatten(error.children ?? [], field)];
  });
}

/**
 * The global ValidationPipe. It refuses NUL characters in bodies and query strings first, and
 * leaves path parameters the strings they arrived as: the stock pipe would turn '0x1', '1e0' and
 * '1.0' into 1 before ParseIdPipe could refuse them.
 */
class ThermbayValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (metadata.type === 'body' || metadata.type === 'query') {
      const problems = nulCharacterProblems(value);
      if (problems.length > 0) throw new RequestValidationException(problems);
    }
    return super.transform(value, metadata);
  }

  /** A body that passes every rule is let through without class-validator's error records (see passesEveryRule). */
  protected override validate(
    object: object,
    validatorOptions?: ValidatorOptions,
  ): Promise<ValidationError[]> | ValidationError[] {
    return passesEveryRule(object, validatorOptions) ? [] : super.validate(object, validatorOptions);
  }

  protected transformPrimitive(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type === 'param') return value;
    return super.transformPrimitive(value, metadata);
  }
}

type Rules = ReturnType<MetadataStorage['getTargetValidationMetadatas']>;
const RULES_KEPT = Symbol.for('thermbay.validationRulesKept');

/**
 * Keeps each class's validation rules once looked up. class-validator looks them up afresh for
 * every object it checks, nested ones included: it filters the class's rules, walks every
 * registered class for ancestors, then groups the rules by property (about a tenth of a design
 * estimate's CPU time). The rules are fixed once the DTO classes are loaded; registering any rule
 * or constraint later empties what was kept, so the answers are always the ones class-validator
 * would give. Lookups by validation group are not kept (the API uses none).
 */
export function keepValidationRules(storage: MetadataStorage = getMetadataStorage()): void {
  const marked = storage as MetadataStorage & { [RULES_KEPT]?: true };
  if (marked[RULES_KEPT]) return;
  marked[RULES_KEPT] = true;

  const lookUp = storage.getTargetValidationMetadatas.bind(storage);
  const groupByProperty = storage.groupByPropertyName.bind(storage);
  let rulesByClass = new Map<unknown, Map<string, Rules>>();
  let groupedRules = new WeakMap<Rules, ReturnType<MetadataStorage['groupByPropertyName']>>();
  const forget = () => {
    rulesByClass = new Map();
    groupedRules = new WeakMap();
  };
  const addValidationMetadata = storage.addValidationMetadata.bind(storage);
  const addConstraintMetadata = storage.addConstraintMetadata.bind(storage);
  storage.addValidationMetadata = (metadata) => {
    forget();
    addValidationMetadata(metadata);
  };
  storage.addConstraintMetadata = (metadata) => {
    forget();
    addConstraintMetadata(metadata);
  };

  storage.getTargetValidationMetadatas = (target, schema, always, strictGroups, groups) => {
    if (groups && groups.length > 0) return lookUp(target, schema, always, strictGroups, groups);
    let byOptions = rulesByClass.get(target);
    if (!byOptions) rulesByClass.set(target, (byOptions = new Map()));
    const key = `${schema}\u0000${always}\u0000${strictGroups}`;
    let rules = byOptions.get(key);
    if (!rules) byOptions.set(key, (rules = lookUp(target, schema, always, strictGroups, groups)));
    return rules;
  };
  storage.groupByPropertyName = (rules) => {
    let grouped = groupedRules.get(rules);
    if (!grouped) groupedRules.set(rules, (grouped = groupByProperty(rules)));
    return grouped;
  };
}

/** The one validation pipe: strips nothing silently (unknown fields are an error) and converts types. */
export function createValidationPipe(): ValidationPipe {
  keepValidationRules();
  return new ThermbayValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => new RequestValidationException(flatten(errors)),
  });
}

/**
 * The field may be left out, but not sent as null. class-validator's IsOptional lets null
 * through as well, which then reaches the service as if it were a value (a NOT NULL column,
 * `conditions.x` of null). Fields where null means something (no curtain, no note) keep
 * IsOptional; every other optional field uses this.
 */
export function Omittable(options?: ValidationOptions): PropertyDecorator {
  return ValidateIf((_object, value) => value !== undefined, options);
}

/** A day of the calendar written YYYY-MM-DD (so 2027-02-29 and 2027-13-45 are refused, not rolled over). */
export function isCalendarDate(value: unknown): boolean {
  if (typeof value !== 'string') return false;
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  if (!match) return false;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

export function IsCalendarDate(options?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    {
      name: 'isCalendarDate',
      validator: {
        validate: (value) => isCalendarDate(value),
        defaultMessage: (args) => `${args?.property} must be a day of the calendar written YYYY-MM-DD`,
      },
    },
    options,
  );
}
