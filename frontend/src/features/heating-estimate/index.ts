export { HeatingPanel, type HeatingPanelProps } from './components/heating-panel';
export { heatingEstimateKeys } from './queries';
