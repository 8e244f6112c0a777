/** The one route table: pages and links build URLs from here. */
export const paths = {
  home: '/',
  login: '/login',
  register: '/register',
  forgotPassword: '/forgot-password',
  invitation: (token: string) => `/invitations/${token}`,
  resetPassword: (token: string) => `/reset-password/${token}`,
  farms: '/farms',
  farm: (farmId: number | string) => `/farms/${farmId}`,
  newHouse: (farmId: number | string) => `/farms/${farmId}/houses/new`,
  house: (houseId: number | string) => `/houses/${houseId}`,
  report: (reportId: number | string) => `/reports/${reportId}`,
  houseSeason: (houseId: number | string, alternativeId?: number) =>
    alternativeId ? `/houses/${houseId}/season?alternative=${alternativeId}` : `/houses/${houseId}/season`,
  houseSideBySide: (houseId: number | string, alternativeIds?: number[]) =>
    alternativeIds && alternativeIds.length > 0
      ? `/houses/${houseId}/side-by-side?alternatives=${alternativeIds.join(',')}`
      : `/houses/${houseId}/side-by-side`,
  settings: '/settings',
  adminUsers: '/admin/users',
  adminOutbox: '/admin/outbox',
  messages: '/messages',
  fuelRecords: (farmId: number | string) => `/farms/${farmId}/fuel-records`,
} as const;
