export { SeasonBudgetSection } from './components/season-budget-section';
export { seasonBudgetQueryOptions } from './queries';
