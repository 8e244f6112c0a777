export { SeasonBudgetSection } from './components/season-budget-section';
export { seasonBudgetQueryOptions, seasonBudgetKeys } from './queries';
