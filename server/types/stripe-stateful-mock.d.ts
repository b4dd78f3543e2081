declare module 'stripe-stateful-mock' {
  import type { Express } from 'express';
  export function createExpressApp(): Express;
}
