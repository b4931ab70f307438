/** A checkout session as the fake keeps it, in the provider's documented shape (the fields Wiretrail reads). */
export interface FakeCheckoutSession {
  id: string;
  object: 'checkout.session';
  mode: string;
  status: 'open' | 'complete' | 'expired';
  payment_status: 'unpaid' | 'paid';
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string | null;
  payment_intent: string | null;
  url: string;
  /** Seconds since 1970: after it the session takes no payment. */
  expires_at: number;
  amount_refunded: number;
}

export interface FakeRefund {
  id: string;
  object: 'refund';
  amount: number;
  currency: string;
  payment_intent: string;
  reason: string | null;
  metadata: Record<string, string>;
  status: 'succeeded';
}

export interface FakeEvent {
  id: string;
  type: string;
  created: number;
  data: { object: FakeCheckoutSession };
  /** Each delivery attempt to the webhook: its HTTP status, or the error. */
  deliveries: Array<{ at: string; status?: number; error?: string }>;
}

export interface PaymentsFake {
  url: string;
  port: number;
  sessions: Map<string, FakeCheckoutSession>;
  events: FakeEvent[];
  refunds: FakeRefund[];
  /** Makes the provider refuse refunds (500) until set back, as when it is down. */
  refuseRefunds(refuse?: boolean): void;
  /** Where events go; undefined holds them back (they stay in `events`, to be resent). */
  setWebhookUrl(url: string | undefined): void;
  /** Pays a session as the customer would on the fake's page; answers 303 when paid, 402 when the card is declined. */
  pay(sessionId: string, card?: string): Promise<Response>;
  close(): Promise<void>;
}

export const DECLINED_CARD: string;
export function signPayload(payload: string, secret: string, timestamp?: number): string;
export function startPaymentsFake(options?: { port?: number; host?: string; webhookUrl?: string; webhookSecret?: string; log?: (line: string) => void }): Promise<PaymentsFake>;
