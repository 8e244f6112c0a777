import * as initialSchema from './0001-initial-schema';
import * as farmClimates from './0002-farm-climates';
import * as seasonData from './0003-season-data';
import * as housePhysics from './0009-house-physics';

/**
 * Every schema change, in order. Add a file `NNNN-what-it-does.ts` exporting up/down and list it
 * here; migrations already applied to a database are recorded in its `migrations` table.
 */
export const MIGRATIONS = [
  { name: '0001-initial-schema', ...initialSchema },
  { name: '0002-farm-climates', ...farmClimates },
  { name: '0003-season-data', ...seasonData },
  { name: '0009-house-physics', ...housePhysics },
];
