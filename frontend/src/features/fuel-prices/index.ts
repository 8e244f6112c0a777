export { FuelPricesEditor } from './components/fuel-prices-editor';
export { farmFuelPricesQueryOptions, fuelPriceKeys } from './queries';
