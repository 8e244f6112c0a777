export { SeasonView, type ClimateLogOption } from './components/season-view';
export { seasonKeys } from './queries';
