export { FuelPricesEditor } from './components/fuel-prices-editor';
export { farmFuelPricesQueryOptions } from './queries';
