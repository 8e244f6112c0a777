export { CoolingPanel, type CoolingPanelProps } from './components/cooling-panel';
