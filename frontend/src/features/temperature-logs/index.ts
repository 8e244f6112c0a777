export { TemperatureLogsSection } from './components/temperature-logs-section';
export { farmTemperatureLogsQueryOptions, temperatureLogKeys } from './queries';
