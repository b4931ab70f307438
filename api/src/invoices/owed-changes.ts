import { Injectable, Logger } from '@nestjs/common';

type Listener = (invoiceId: string) => Promise<void>;

/**
 * Told, after the commit, whenever what an invoice owes has changed (a payment, an issued credit note), so that what
 * was offered on the old figure (an open card checkout) is withdrawn. Features that offer such things listen;
 * the invoices never import them.
 */
@Injectable()
export class OwedChanges {
  private readonly logger = new Logger('OwedChanges');
  private readonly listeners: Listener[] = [];

  listen(listener: Listener): void {
    this.listeners.push(listener);
  }

  /** Waits for every listener, so that the office's answer comes after the old offers are gone; never throws. */
  async changed(invoiceId: string): Promise<void> {
    for (const listener of this.listeners) {
      try {
        await listener(invoiceId);
      } catch (err) {
        this.logger.warn(`After invoice ${invoiceId} changed: ${err instanceof Error ? err.message : String(err)}`);
      }
    }
  }
}
