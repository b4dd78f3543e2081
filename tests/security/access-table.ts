/**
 * Who may call each API route. Every route the app answers must be listed here: a new route
 * fails this test until its access is written down (and so checked).
 *   public     anyone, signed in or not
 *   signed-in  any account (401 for visitors)
 *   staff      seller or admin (401 visitors, 403 buyers)
 *   admin      admin only (401 visitors, 403 buyers and sellers)
 *   signature  no session grants it: the payment provider's signed webhook (4xx without a signature)
 *   auth-lib   the auth library's own endpoints (sign-up, sign-in, sessions), tested in tests/server/accounts
 */
export type Access = 'public' | 'signed-in' | 'staff' | 'admin' | 'signature' | 'auth-lib';
export const ACCESS: Record<string, Access> = {
  'ALL /api/auth/{*any}': 'auth-lib',
  'POST /api/auth/sign-in/email': 'public',
  // Checked in front of the library (name and e-mail rules); the library itself demands a session.
  'POST /api/auth/update-user': 'auth-lib',
  'POST /api/auth/change-email': 'auth-lib',
  'POST /api/webhooks/payments': 'signature',
  'GET /api/health': 'public',
  'GET /api/slabs': 'public',
  'GET /api/slabs/:id': 'public',
  'GET /api/species': 'public',
  'GET /api/figure-kinds': 'public',
  'GET /api/me': 'signed-in',
  'GET /api/me/preferences': 'signed-in',
  'PUT /api/me/preferences': 'signed-in',
  'POST /api/slabs/:id/hold': 'signed-in',
  'POST /api/holds/matched-set': 'signed-in',
  'GET /api/holds': 'signed-in',
  'DELETE /api/holds/:id': 'signed-in',
  'GET /api/compare': 'public',
  'GET /api/me/slab-marks': 'signed-in',
  'GET /api/saved-slabs': 'signed-in',
  'PUT /api/saved-slabs/:slabId': 'signed-in',
  'DELETE /api/saved-slabs/:slabId': 'signed-in',
  'POST /api/slabs/:id/watch': 'signed-in',
  'DELETE /api/slabs/:id/watch': 'signed-in',
  'POST /api/checkout': 'signed-in',
  'GET /api/orders': 'signed-in',
  'GET /api/orders/:id': 'signed-in',
  'POST /api/orders/:id/payment-check': 'signed-in',
  'POST /api/orders/:id/payment-cancel': 'signed-in',
  'GET /api/sales-terms': 'public',
  'GET /api/office/sales-terms': 'admin',
  'PUT /api/office/sales-terms': 'admin',
  'GET /api/account/resale-certificate': 'signed-in',
  'PUT /api/account/resale-certificate': 'signed-in',
  'GET /api/office/resale-certificates': 'admin',
  'POST /api/office/resale-certificates/:id/review': 'admin',
  'GET /api/pickup-slots': 'signed-in',
  'GET /api/pickup-settings': 'admin',
  'PUT /api/pickup-settings': 'admin',
  'GET /api/office/mill-rules': 'admin',
  'PUT /api/office/mill-rules': 'admin',
  'GET /api/logs': 'staff',
  'POST /api/logs': 'staff',
  'GET /api/logs/:id': 'staff',
  'PATCH /api/logs/:id': 'staff',
  'POST /api/slabs': 'staff',
  'PATCH /api/slabs/:id': 'staff',
  'GET /api/yard/slabs': 'staff',
  'GET /api/yard/slabs.csv': 'staff',
  'POST /api/yard/slabs/bulk': 'staff',
  'GET /api/yard/slabs/:id': 'staff',
  'GET /api/yard/shop-address': 'staff',
  'POST /api/figure-kinds': 'staff',
  'GET /api/slabs/:id/photos': 'staff',
  'POST /api/slabs/:id/photos': 'staff',
  'POST /api/slabs/:id/photos/order': 'staff',
  'PATCH /api/slabs/:id/photos/:photoId': 'staff',
  'DELETE /api/slabs/:id/photos/:photoId': 'staff',
  'GET /api/slabs/:id/moisture-readings': 'staff',
  'POST /api/slabs/:id/moisture-readings': 'staff',
  'POST /api/moisture-readings/batch': 'staff',
  'DELETE /api/moisture-readings/:id': 'staff',
  'GET /api/office/users': 'admin',
  'PATCH /api/office/users/:id': 'admin',
  'GET /api/office/audit': 'admin',
  'GET /api/office/numbers': 'admin',
  'GET /api/office/holds': 'admin',
  'DELETE /api/office/holds/:id': 'admin',
  'GET /api/office/orders': 'admin',
  'GET /api/office/orders/:id': 'admin',
  'POST /api/office/orders/:id/refunds': 'admin',
  'GET /api/office/pickups': 'admin',
  'POST /api/office/orders/:id/picked-up': 'admin',
  'POST /api/office/orders/:id/no-show': 'admin',
  'POST /api/office/orders/:id/reschedule': 'admin',
};

/** The least-privileged role that a route lets through (for tests that need one allowed caller). */
export const ALLOWED_ROLE: Record<Exclude<Access, 'auth-lib' | 'signature'>, 'buyer' | 'seller' | 'admin' | null> = {
  public: null, 'signed-in': 'buyer', staff: 'seller', admin: 'admin',
};
