/** The one route table: pages and links build URLs from here. */
export const paths = {
  home: '/',
  login: '/login',
  register: '/register',
  farms: '/farms',
  farm: (farmId: number | string) => `/farms/${farmId}`,
  newHouse: (farmId: number | string) => `/farms/${farmId}/houses/new`,
  house: (houseId: number | string) => `/houses/${houseId}`,
  houseSeason: (houseId: number | string, alternativeId?: number) =>
    alternativeId ? `/houses/${houseId}/season?alternative=${alternativeId}` : `/houses/${houseId}/season`,
  houseSideBySide: (houseId: number | string, alternativeIds?: number[]) =>
    alternativeIds && alternativeIds.length > 0
      ? `/houses/${houseId}/side-by-side?alternatives=${alternativeIds.join(',')}`
      : `/houses/${houseId}/side-by-side`,
  settings: '/settings',
  adminUsers: '/admin/users',
} as const;
