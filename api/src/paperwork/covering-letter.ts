import { registerMailPartial } from '../mail/mail-template.js';
import type { JobFile } from './job-file.js';

/** The work the paper is about, as the customer knows it: where, and the job's reference and title when it has one. */
export function theWork(file: JobFile): string {
  const { job, site } = file;
  const where = [site.address, site.postcode].filter(Boolean).join(', ');
  return `the work at ${where}${job.reference ? ` (our job ${job.reference}, “${job.title}”)` : ''}`;
}

/** What every covering letter says around its body. */
export interface CoveringLetter {
  greeting: string;
  /** The office's own words, before the letter's. */
  message: string | null;
  signOff: { name: string; lines: string[] };
}

/**
 * The greeting (by name when it goes to the customer's own address), the office's own message if it wrote one, the
 * letter's body, and the contractor's sign-off with their address and contact: `{{#> covering}}body{{/covering}}`.
 */
registerMailPartial(
  'covering',
  `{{greeting}}

{{#if message}}
{{message}}

{{/if}}
{{> @partial-block}}

Kind regards,
{{signOff.name}}
{{#each signOff.lines}}
{{this}}
{{/each}}
`,
);

export function coveringLetter(file: JobFile, to: string, message?: string | null): CoveringLetter {
  const { organisation: org, customer } = file;
  const greeting = customer?.email && customer.email.toLowerCase() === to.toLowerCase() && customer.name ? `Hello ${customer.name},` : 'Hello,';
  return {
    greeting,
    message: message?.trim() || null,
    signOff: { name: org.name, lines: [org.address, [org.phone, org.email].filter(Boolean).join(' · ')].filter((l): l is string => !!l) },
  };
}
