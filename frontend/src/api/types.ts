/**
 * The API's shapes as the frontend uses them. Written from the contract until the backend's
 * OpenAPI document exists; then these become aliases of the generated `schema.d.ts`.
 */

export type UnitSystem = 'si' | 'us';
export type SiteRole = 'admin' | 'user';
export type FarmRole = 'owner' | 'grower' | 'adviser' | 'viewer';
export type Permission =
  | 'farm:read'
  | 'farm:update'
  | 'farm:delete'
  | 'members:manage'
  | 'house:read'
  | 'house:write'
  | 'estimate:run'
  | 'report:write';

export interface User {
  id: number;
  email: string;
  name: string;
  siteRole: SiteRole;
  unitSystem: UnitSystem;
}

export interface AuthResponse {
  accessToken: string;
  user: User;
}

export interface LoginRequest {
  email: string;
  password: string;
}

export interface RegisterRequest {
  email: string;
  password: string;
  name: string;
}

export interface DemoAccount {
  email: string;
  name: string;
  description: string;
}

export interface DemoAccounts {
  enabled: boolean;
  password: string | null;
  accounts: DemoAccount[];
}

export interface UpdateMeRequest {
  name?: string;
  unitSystem?: UnitSystem;
}

export interface UpdateUserRequest {
  siteRole?: SiteRole;
  name?: string;
}

export interface Farm {
  id: number;
  name: string;
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  timeZone: string;
  myRole: FarmRole;
  permissions: Permission[];
  houseCount: number;
  createdAt: string;
  updatedAt: string;
}

export interface FarmInput {
  name: string;
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  timeZone: string;
}

export type HouseShape = 'gable' | 'gothic-arch' | 'quonset';
export type SurfaceGroup = 'roof' | 'sidewalls' | 'endwalls';

export interface HeaterGroup {
  count: number;
  ratedInputW: number;
  efficiency: number;
  fuelId: string;
}

export interface House {
  id: number;
  farmId: number;
  name: string;
  notes: string | null;
  shape: HouseShape;
  spans: number;
  widthM: number;
  lengthM: number;
  eaveHeightM: number;
  ridgeHeightM: number;
  coverings: Record<SurfaceGroup, string>;
  coveringUOverridesWPerM2K: Partial<Record<SurfaceGroup, number>>;
  airLeakageClassId: string;
  airChangesPerHourOverride: number | null;
  perimeterInsulated: boolean;
  curtainId: string | null;
  heaters: HeaterGroup[];
  exhaustFans: { count: number; capacityEachM3PerS: number };
  inletAreaM2: number;
  setpoints: { dayHeatingC: number; nightHeatingC: number; coolingC: number };
  createdAt: string;
  updatedAt: string;
}

/** Body of POST /api/farms/:farmId/houses (PATCH takes any part of it). */
export type HouseInput = Omit<House, 'id' | 'farmId' | 'createdAt' | 'updatedAt'>;

export interface ReferenceRow {
  id: string;
  label: string;
  source: string;
  confidence: string;
  [value: string]: unknown;
}

export interface ReferenceTable {
  title: string;
  description: string;
  rows: ReferenceRow[];
}

export type ReferenceData = Record<string, ReferenceTable>;

export interface Health {
  status: string;
  version: string;
}
