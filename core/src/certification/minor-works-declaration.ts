/**
 * What the person who signs a minor works certificate declares, in Wiretrail's words, carrying the information of
 * the declaration on the standard's model form (BS 7671:2018+A2:2022 Appendix 6): the work does not impair the
 * safety of the existing installation, it was designed, constructed, inspected and tested to BS 7671 with the
 * amendment in force on the completion date (the rule set `ruleSetInForce` finds for that day, named by its published
 * edition), and it complies except for the departures recorded. The phone shows it before signing and
 * the certificate prints it above the signature, so both say the same.
 */

export interface EditionParts {
  /** "BS 7671:2018" */
  readonly standard: string;
  /** "A2:2022", or null for an edition with no amendment. */
  readonly amendment: string | null;
}

/** An edition as a rule set names it ("BS 7671:2018+A2:2022"), split into the standard and its latest amendment. */
export function editionParts(edition: string): EditionParts {
  const parts = edition.split('+').map((p) => p.trim());
  return { standard: parts[0]!, amendment: parts.length > 1 ? parts[parts.length - 1]! : null };
}

/** "BS 7671:2018 as amended to A2:2022". */
export function amendedTo(edition: string): string {
  const { standard, amendment } = editionParts(edition);
  return amendment ? `${standard} as amended to ${amendment}` : standard;
}

/**
 * The declaration, for the edition of the rule set in force on the completion date and that date as the reader
 * should see it ("5 December 2026"): "in accordance with BS 7671:2018+A3:2024, in force on 5 December 2026".
 */
export function minorWorksDeclaration(edition: string, completedOn: string): string {
  const { standard } = editionParts(edition);
  const family = standard.split(':')[0]!;
  const inForce = completedOn ? `${edition}, in force on ${completedOn}` : edition;
  return (
    'The person signing below certifies that the work described on this certificate does not impair the safety of the existing installation; ' +
    `that it was designed, constructed, inspected and tested in accordance with ${inForce}; ` +
    `and that, to the best of their knowledge and belief at the time of their inspection, it complies with ${family} except for the departures recorded on this certificate.`
  );
}

/** Headings of the certificate's sections that name the regulation asking for them. */
export const EXISTING_INSTALLATION_REG = 'Reg 644.1.2';
export const PERMITTED_EXCEPTIONS_REG = 'Reg 411.3.3';
