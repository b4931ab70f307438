import { Injectable } from '@nestjs/common';

export interface CardRefundRequest {
  /** The provider's payment the money goes back to. */
  paymentReference: string;
  amountMinor: number;
  /** The same key asks the provider for the same refund: sent again, it is made once. */
  idempotencyKey: string;
  metadata: Record<string, string>;
}

export type CardRefundResult = { made: true; reference: string } | { made: false; reason: string };

type Maker = (request: CardRefundRequest) => Promise<CardRefundResult>;

/**
 * Where the invoices ask for money to go back to a card. Card payments, which hold the provider's SDK, offer the
 * way to do it when they start; the invoices never import them. Without a provider there is no way to a card.
 */
@Injectable()
export class CardRefunds {
  private maker: Maker | null = null;

  offer(maker: Maker): void {
    this.maker = maker;
  }

  get available(): boolean {
    return this.maker !== null;
  }

  make(request: CardRefundRequest): Promise<CardRefundResult> {
    if (!this.maker) return Promise.resolve({ made: false, reason: 'Card payments are not set up, so nothing can go back to a card.' });
    return this.maker(request);
  }
}
