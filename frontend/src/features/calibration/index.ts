export { CalibrationBasisSwitch, useHeatLossBasisParam } from './components/calibration-basis-switch';
export { CalibrationResults } from './components/calibration-results';
export { FuelRecordsGrid } from './components/fuel-records-grid';
export { FuelRecordsUpload } from './components/fuel-records-upload';
export { fuelOptions } from './fuel-record-values';
export { useRunCalibration } from './mutations';
export { calibrationsQueryOptions, fuelRecordsQueryOptions } from './queries';
