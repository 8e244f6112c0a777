export { HeatingPanel, type HeatingPanelProps } from './components/heating-panel';
export { heatingEstimateKeys } from './queries';
export { HeatingSummaryBar } from './components/heating-summary-bar';
