export { sunPosition, sunTimes, solarNoonUtc, type SunPosition, type SunTimes } from './sun-position';
export { clearSkyIrradiance, type ClearSkyIrradiance } from './clear-sky';
