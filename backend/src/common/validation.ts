import { ValidationError, ValidationPipe } from '@nestjs/common';
import { FieldProblem, RequestValidationException } from './filters/all-exceptions.filter';

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

/** The one validation pipe: strips nothing silently (unknown fields are an error) and converts types. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => new RequestValidationException(flatten(errors)),
  });
}
