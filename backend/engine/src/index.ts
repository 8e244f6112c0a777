/**
 * The engine's front door: the three estimates, the shared vocabulary and the one error it throws.
 * Deeper modules are reachable as `@thermbay/engine/<folder>/<file>`.
 */
export * from './vocabulary';
export * from './errors';
export { estimateHeating } from './estimate-heating';
export { estimateCooling } from './estimate-cooling';
export { estimateSeason } from './estimate-season';
