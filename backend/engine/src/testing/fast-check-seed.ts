/**
 * For specs only (left out of the build): every fast-check property runs from one known seed, so a
 * run can be repeated. A failing property prints its seed and path (fast-check's report); to run
 * again with another seed, set FC_SEED (`FC_SEED=123 npx jest`).
 */
import fc from 'fast-check';

const DEFAULT_SEED = 20_261_202;
const fromEnvironment = Number(process.env.FC_SEED);
const seed = Number.isInteger(fromEnvironment) && process.env.FC_SEED !== '' ? fromEnvironment : DEFAULT_SEED;

fc.configureGlobal({ seed, verbose: 1 });
