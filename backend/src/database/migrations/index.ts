import * as initialSchema from './0001-initial-schema';
import * as farmClimates from './0002-farm-climates';
import * as seasonData from './0003-season-data';
import * as rowVersions from './0004-row-versions';
import * as loginAttempts from './0005-login-attempts';
import * as mailInvitationsPasswordTokens from './0006-mail-invitations-password-tokens';
import * as reports from './0007-reports';
import * as houseAlternatives from './0008-house-alternatives';
import * as housePhysics from './0009-house-physics';
import * as weatherYears from './0010-weather-years';
import * as farmCurrency from './0011-farm-currency';
import * as fuelRecordsCalibrations from './0012-fuel-records-calibrations';
import * as houseMeasurePlans from './0013-house-measure-plans';
import * as houseShadeCloth from './0014-house-shade-cloth';
import * as houseLamps from './0015-house-lamps';

/**
 * Every schema change, in order. Add a file `NNNN-what-it-does.ts` exporting up/down and list it
 * here; migrations already applied to a database are recorded in its `migrations` table.
 */
export const MIGRATIONS = [
  { name: '0001-initial-schema', ...initialSchema },
  { name: '0002-farm-climates', ...farmClimates },
  { name: '0003-season-data', ...seasonData },
  { name: '0004-row-versions', ...rowVersions },
  { name: '0005-login-attempts', ...loginAttempts },
  { name: '0006-mail-invitations-password-tokens', ...mailInvitationsPasswordTokens },
  { name: '0007-reports', ...reports },
  { name: '0008-house-alternatives', ...houseAlternatives },
  { name: '0009-house-physics', ...housePhysics },
  { name: '0010-weather-years', ...weatherYears },
  { name: '0011-farm-currency', ...farmCurrency },
  { name: '0012-fuel-records-calibrations', ...fuelRecordsCalibrations },
  { name: '0013-house-measure-plans', ...houseMeasurePlans },
  { name: '0014-house-shade-cloth', ...houseShadeCloth },
  { name: '0015-house-lamps', ...houseLamps },
];
