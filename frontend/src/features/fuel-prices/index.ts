export { FuelPricesEditor } from './components/fuel-prices-editor';
export { farmFuelPricesQueryOptions } from './queries';
export { MissingPriceForm, type MissingPriceFuel } from './components/missing-price-form';
