export { HeatingPanel, type HeatingPanelProps } from './components/heating-panel';
export { HeatingSummaryBar } from './components/heating-summary-bar';
