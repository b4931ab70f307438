/**
 * The choices the checks before the work take, kept apart from the checks so that the field registry (which every
 * screen loads) carries only these words and not the calculations.
 */

/** What a point or circuit supplies, as the RCD requirement distinguishes it. */
export const RCD_CIRCUIT_KINDS = ['sockets', 'lighting', 'shower', 'cooker', 'fixed-equipment', 'outdoor-mobile'] as const;
export type RcdCircuitKind = (typeof RCD_CIRCUIT_KINDS)[number];

export const POINT_LOCATIONS = ['indoors', 'bathroom', 'outdoors'] as const;
export type PointLocation = (typeof POINT_LOCATIONS)[number];

/** The reference installation methods of BS 7671 Appendix 4 Table 4D5 for flat twin-and-earth. */
export const INSTALLATION_METHODS = ['A', 'C', '100', '101', '102', '103'] as const;
export type InstallationMethod = (typeof INSTALLATION_METHODS)[number];
