import Stripe from 'stripe';
import type { PaymentsConfig } from '../config/payments.config.js';

export const PAYMENT_PROVIDER = Symbol('PaymentProvider');

/**
 * The provider's official SDK, set up from the environment: pointed at PAYMENTS_API_URL when it is given (the
 * local fake), at the real provider otherwise. Without an API key there are no card payments.
 */
export function createPaymentProvider(config: PaymentsConfig): Stripe | null {
  if (!config.apiKey) return null;
  return new Stripe(config.apiKey, {
    ...(config.api ?? {}),
    maxNetworkRetries: 1,
    timeout: 20_000,
    telemetry: false,
    appInfo: { name: 'Wiretrail' },
  });
}
