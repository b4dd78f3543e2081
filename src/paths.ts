/** Every link in the client is built here. */
type Query = Record<string, string | number | boolean | undefined | null>;

const withQuery = (path: string, query?: Query) => {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v !== undefined && v !== null && v !== '') params.set(k, String(v));
  const qs = params.toString();
  return qs ? `${path}?${qs}` : path;
};

export const paths = {
  catalogue: (query?: Query) => withQuery('/', query),
  slab: (id: number | string) => `/slabs/${id}`,
  log: (id: number | string) => `/logs/${id}`,
  signIn: (next?: string) => withQuery('/sign-in', { next }),
  signUp: (next?: string) => withQuery('/sign-up', { next }),
  forgotPassword: () => '/forgot-password',
  resetPassword: () => '/reset-password',
  account: () => '/account',
  reservations: () => '/reservations',
  saved: () => '/saved',
  compare: () => '/compare',
  checkout: () => '/checkout',
  orders: () => '/orders',
  order: (id: number | string) => `/orders/${id}`,
  // Yard desk: the mill staff's side.
  yard: () => '/yard',
  yardLogs: () => '/yard/logs',
  yardLogNew: () => '/yard/logs/new',
  yardLog: (id: number | string) => `/yard/logs/${id}`,
  yardSlabNew: (query?: Query) => withQuery('/yard/slabs/new', query),
  yardSlab: (id: number | string) => `/yard/slabs/${id}`,
  yardSlabPhotos: (id: number | string) => `/yard/slabs/${id}/photos`,
  yardSlabReadings: (id: number | string) => `/yard/slabs/${id}/readings`,
  yardReadings: () => '/yard/readings',
  yardLabels: (ids?: number[]) => withQuery('/yard/labels', { ids: ids?.join(',') }),
  // Office: the admins' side.
  office: () => '/office',
  officePickups: () => '/office/pickups',
  officeOrders: () => '/office/orders',
  officeOrder: (id: number | string) => `/office/orders/${id}`,
  officeHolds: () => '/office/holds',
  officeUsers: () => '/office/users',
  officeAudit: (query?: Query) => withQuery('/office/audit', query),
  officeNumbers: () => '/office/numbers',
  officeSettings: () => '/office/settings',
  officeRules: () => '/office/rules',
} as const;
