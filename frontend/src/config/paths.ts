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
  houseSeason: (houseId: number | string) => `/houses/${houseId}/season`,
  report: (reportId: number | string) => `/reports/${reportId}`,
  settings: '/settings',
  adminUsers: '/admin/users',
  adminOutbox: '/admin/outbox',
  messages: '/messages',
} as const;
