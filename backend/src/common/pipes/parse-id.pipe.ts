import { type ArgumentMetadata, Injectable, NotFoundException, type PipeTransform } from '@nestjs/common';
import { RequestValidationException } from '../filters/all-exceptions.filter';

/** Largest id a row can have (a signed 32-bit integer, as both SQLite and PostgreSQL serials allow). */
const MAX_ID = 2_147_483_647;

/**
 * A row id in the path: only a canonical positive whole number ("12", never "012", "1e1",
 * "1.0", "0x1" or " 1"), so that one resource has one address. Anything else is a 400 naming
 * the parameter. The global validation pipe leaves path parameters as the strings they arrived
 * as (see createValidationPipe), so this pipe sees exactly what was sent.
 */
@Injectable()
export class ParseIdPipe implements PipeTransform<unknown, number> {
  transform(value: unknown, metadata: ArgumentMetadata): number {
    const name = metadata.data ?? 'id';
    if (typeof value === 'string' && /^[1-9]\d*$/.test(value)) {
      const id = Number(value);
      if (id <= MAX_ID) return id;
      // A well-formed id no row can have: simply not found, the same on every database.
      throw new NotFoundException(`No such ${name.replace(/Id$/, '')}`);
    }
    throw new RequestValidationException([{ field: name, message: `${name} must be a whole number from 1 upwards` }]);
  }
}
