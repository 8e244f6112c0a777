import type { FieldProblem } from './filters/all-exceptions.filter';

/**
 * Text with a NUL character (U+0000) is refused at the door: PostgreSQL cannot store it in a text
 * column and SQLite would keep it, so the two databases would disagree on what was saved.
 * Returns one problem per string (at any depth) that holds one, named by its dotted path.
 */
export function nulCharacterProblems(value: unknown, path = '', found: FieldProblem[] = []): FieldProblem[] {
  if (found.length >= 20) return found;
  if (typeof value === 'string') {
    if (value.includes('\u0000')) {
      found.push({ field: path || 'body', message: `${path || 'body'} must not contain a NUL character` });
    }
  } else if (Array.isArray(value)) {
    value.forEach((item, index) => nulCharacterProblems(item, `${path}[${index}]`, found));
  } else if (value !== null && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) {
      nulCharacterProblems(item, path ? `${path}.${key}` : key, found);
    }
  }
  return found;
}
