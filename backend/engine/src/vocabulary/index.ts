/**
 * The words both tiers share: input bounds, house shapes and surface groups, quantity kinds with
 * their SI units and the prose token format, confidence levels, the assumption record and what an
 * alternative changes in words.
 * The API's DTOs, the engine and the UI's schemas import them from here and nowhere else.
 */
export * from './bounds';
export * from './house-words';
export * from './quantities';
export * from './display-units';
export * from './assumption';
export * from './passwords';
export * from './currency';
export * from './changed-fields';
