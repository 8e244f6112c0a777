export { SeasonView, type ClimateLogOption } from './components/season-view';
