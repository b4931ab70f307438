import type { EntityManager } from 'typeorm';
import { OutboxMessage } from '../mail/entities/outbox-message.entity.js';

/** What a feature shows of a message's progress: the same words for a document and for an invoice. */
export interface MailState {
  emailState: 'queued' | 'sent' | 'failed';
  emailedTo?: string;
  emailedAt?: Date;
  emailError: string | null;
}

/** After an attempt: sent (to whom, when), failed for good (after how many attempts, and why), or queued to try again. */
export function mailState(message: OutboxMessage, maxAttempts: number): MailState {
  if (message.state === 'sent') return { emailState: 'sent', emailedTo: message.toAddress, emailedAt: message.sentAt ?? new Date(), emailError: null };
  if (message.state === 'failed') {
    const tries = `${message.attempts} ${message.attempts === 1 ? 'attempt' : 'attempts'}`;
    return { emailState: 'failed', emailError: `Not sent after ${tries}: ${message.lastError ?? 'no reason given'}`.slice(0, 500) };
  }
  return { emailState: 'queued', emailError: `Attempt ${message.attempts} of ${maxAttempts} failed, trying again: ${message.lastError ?? ''}`.slice(0, 500) };
}

/** A later send of the same subject speaks for it now: an older message's news is not written back. */
export async function isLatestMessage(em: EntityManager, message: OutboxMessage): Promise<boolean> {
  const latest = await em.findOne(OutboxMessage, { where: { purpose: message.purpose, subjectId: message.subjectId ?? '' }, order: { id: 'DESC' } });
  return latest?.id === message.id;
}
