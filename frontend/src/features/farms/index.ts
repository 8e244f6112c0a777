export { FarmsTable } from './components/farms-table';
export { FarmFormDialog } from './components/farm-form-dialog';
export { FarmSummary } from './components/farm-summary';
export { farmsListQueryOptions, farmDetailQueryOptions } from './queries';
export { useDeleteFarm } from './mutations';
export { farmAllows } from './permissions';
