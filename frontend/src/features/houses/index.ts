export { HouseForm } from './components/house-form';
export { HousesTable } from './components/houses-table';
export { farmHousesQueryOptions, houseDetailQueryOptions } from './queries';
export { useCreateHouse, useDeleteHouse, useDuplicateHouse, useUpdateHouse } from './mutations';
export { houseInputOf, newHouseDefaults } from './house-form-values';
