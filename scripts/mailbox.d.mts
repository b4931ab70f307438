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
  /** The envelope's recipients. */
  to: string[];
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
