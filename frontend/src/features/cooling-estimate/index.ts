export { CoolingPanel, type CoolingPanelProps } from './components/cooling-panel';
export { coolingEstimateKeys } from './queries';
