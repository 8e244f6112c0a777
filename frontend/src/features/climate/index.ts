export { ClimateSection } from './components/climate-section';
export { ClimateEditor } from './components/climate-editor';
export { farmClimateQueryOptions } from './queries';
export { usePutFarmClimate } from './mutations';
