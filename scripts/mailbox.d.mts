export interface ReceivedAttachment {
  filename: string;
  contentType: string;
  size: number;
  content: Buffer;
}

export interface ReceivedMail {
  id: number;
  receivedAt: string;
  from: string;
  replyTo: string;
  /** The envelope's recipients: those in To and those in Cc. */
  to: string[];
  /** The To header, as those it reached see it. */
  toHeader: string;
  /** The Cc header: who got a copy. */
  cc: string;
  subject: string;
  text: string;
  html: string;
  attachments: ReceivedAttachment[];
}

export interface Mailbox {
  port: number;
  messages: ReceivedMail[];
  /** When each message was offered, delivered or turned away (ms since the epoch). */
  offeredAt: number[];
  /** Turns every message away with this SMTP reply until accept(). */
  refuse(code: number, message: string): void;
  accept(): void;
  close(): Promise<void>;
}

export function startMailbox(options?: { port?: number; host?: string; keep?: number }): Promise<Mailbox>;
