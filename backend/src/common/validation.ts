import { type ArgumentMetadata, ValidationError, ValidationPipe } from '@nestjs/common';
import { FieldProblem, RequestValidationException } from './filters/all-exceptions.filter';
import { nulCharacterProblems } from './nul-characters';

function flatten(errors: ValidationError[], parent = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({
      field,
      message: message.replace(error.property, field),
    }));
    return [...own, ...flatten(error.children ?? [], field)];
  });
}

/** The global ValidationPipe, refusing NUL characters in bodies and query strings first. */
class AppValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (metadata.type === 'body' || metadata.type === 'query') {
      const problems = nulCharacterProblems(value);
      if (problems.length > 0) throw new RequestValidationException(problems);
    }
    return super.transform(value, metadata);
  }
}

/** The one validation pipe: strips nothing silently (unknown fields are an error) and converts types. */
export function createValidationPipe(): ValidationPipe {
  return new AppValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => new RequestValidationException(flatten(errors)),
  });
}
