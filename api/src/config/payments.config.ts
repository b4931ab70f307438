import { registerAs } from '@nestjs/config';

/**
 * Card payments through the provider's hosted checkout. Without an API key the pay button is not offered; with
 * PAYMENTS_API_URL the official SDK talks to that address (the local fake) instead of the real provider.
 */
export const paymentsConfig = registerAs('payments', () => {
  const url = process.env.PAYMENTS_API_URL ? new URL(process.env.PAYMENTS_API_URL) : null;
  const protocol: 'http' | 'https' = url?.protocol === 'https:' ? 'https' : 'http';
  return {
    apiKey: process.env.PAYMENTS_API_KEY || null,
    webhookSecret: process.env.PAYMENTS_WEBHOOK_SECRET || null,
    api: url ? { host: url.hostname, port: Number(url.port || (url.protocol === 'https:' ? 443 : 80)), protocol } : null,
    currency: 'gbp',
  };
});

export type PaymentsConfig = ReturnType<typeof paymentsConfig>;
