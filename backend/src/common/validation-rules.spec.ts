import 'reflect-metadata';
import { plainToInstance, Type } from 'class-transformer';
import {
  getMetadataStorage,
  IsInt,
  IsString,
  Max,
  Min,
  ValidateNested,
  validateSync,
  type ValidationError,
} from 'class-validator';
import { keepValidationRules } from './validation';

class Fan {
  @IsInt() @Min(1) count: number;
}

class Base {
  @IsString() name: string;
}

class House extends Base {
  @IsInt() @Max(20) spans: number;
  @ValidateNested() @Type(() => Fan) fans: Fan;
  @IsString({ groups: ['named'] }) label?: string;
}

const OPTIONS = { whitelist: true, forbidNonWhitelisted: true };
const VALID = { name: 'A', spans: 2, fans: { count: 1 }, label: 'B' };
const properties = (errors: unknown) => (errors as { property: string }[]).map((error) => error.property).sort();

/** The errors as plain data: property, constraints and children, at every depth. */
function shape(errors: ValidationError[]): unknown[] {
  return errors.map((error) => ({
    property: error.property,
    constraints: error.constraints,
    children: shape(error.children ?? []),
  }));
}

function check(plain: object, options: object = OPTIONS): unknown[] {
  return shape(validateSync(plainToInstance(House, plain), options));
}

const BODIES = [
  { name: 'A', spans: 2, fans: { count: 1 } },
  { name: 5, spans: 21.5, fans: { count: 0, extra: true }, more: 1 },
  { spans: 'x', fans: 'none' },
  { name: 'A', spans: 2, fans: { count: 1 }, label: 3 },
];

describe('keepValidationRules', () => {
  // class-validator's own answers, before anything is kept
  const before = BODIES.map((body) => check(body));
  const beforeGrouped = BODIES.map((body) => check(body, { ...OPTIONS, groups: ['named'] }));
  keepValidationRules();

  it("gives class-validator's own errors, nested and inherited rules included, every time", () => {
    for (let round = 0; round < 3; round++) {
      expect(BODIES.map((body) => check(body))).toEqual(before);
    }
    // the fixtures do exercise each kind of rule: inherited, own, unknown field, nested
    expect(properties(before[1])).toEqual(['fans', 'label', 'more', 'name', 'spans']);
    const fans = (before[1] as { property: string; children: unknown }[]).find((error) => error.property === 'fans');
    expect(properties(fans?.children)).toEqual(['count', 'extra']);
  });

  it('leaves lookups by validation group to class-validator', () => {
    expect(BODIES.map((body) => check(body, { ...OPTIONS, groups: ['named'] }))).toEqual(beforeGrouped);
    // under a group only that group's rules apply, so the other fields count as unknown
    expect(properties(beforeGrouped[3])).toEqual(['fans', 'label', 'name', 'spans']);
    expect(properties(before[3])).toEqual(['label']);
  });

  it('is installed once however often it is called', () => {
    const storage = getMetadataStorage();
    const lookUp = storage.getTargetValidationMetadatas;
    keepValidationRules();
    keepValidationRules();
    expect(storage.getTargetValidationMetadatas).toBe(lookUp);
  });

  it('applies a rule registered after the class was first checked', () => {
    expect(check(VALID)).toEqual([]);
    // as a class built at run time (PartialType and the like) registers its rules
    IsString()(Fan.prototype, 'count');
    expect(check(VALID)).toEqual([
      {
        property: 'fans',
        constraints: undefined,
        children: [{ property: 'count', constraints: { isString: 'count must be a string' }, children: [] }],
      },
    ]);
  });
});
