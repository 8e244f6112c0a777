export { TemperatureLogsSection } from './components/temperature-logs-section';
export { farmTemperatureLogsQueryOptions } from './queries';
