import type { JobFile } from './job-file.js';

/** The work the paper is about, as the customer knows it: where, and the job's reference and title when it has one. */
export function theWork(file: JobFile): string {
  const { job, site } = file;
  const where = [site.address, site.postcode].filter(Boolean).join(', ');
  return `the work at ${where}${job.reference ? ` (our job ${job.reference}, “${job.title}”)` : ''}`;
}

/**
 * The text of an e-mail that goes with an issued PDF: greeting (by name when it goes to the customer's own
 * address), the body, and the contractor's sign-off with their address and contact.
 */
export function coveringLetter(file: JobFile, to: string, body: string[]): string {
  const { organisation: org, customer } = file;
  const greeting = customer?.email && customer.email.toLowerCase() === to.toLowerCase() && customer.name ? `Hello ${customer.name},` : 'Hello,';
  return [
    greeting,
    '',
    ...body,
    '',
    'Kind regards,',
    org.name,
    ...[org.address, [org.phone, org.email].filter(Boolean).join(' · ')].filter((l): l is string => !!l),
  ].join('\n');
}
