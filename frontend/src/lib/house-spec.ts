import type { HouseInput, HouseSpec } from '../api/types';

/**
 * The physical description of a house, as the stateless estimate routes take it: the stored or
 * edited house without its name and notes (the API refuses fields it does not know).
 */
export function houseSpecOf(house: HouseInput): HouseSpec {
  const { name: _name, notes: _notes, ...rest } = house;
  const {
    id: _id,
    farmId: _farmId,
    version: _version,
    createdAt: _createdAt,
    updatedAt: _updatedAt,
    ...spec
  } = rest as typeof rest &
    Partial<{ id: number; farmId: number; version: number; createdAt: string; updatedAt: string }>;
  return spec;
}
