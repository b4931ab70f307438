/** Who a user is to the organisation. Here, not with the user entity, because the guards and decorators judge by it. */
export const ROLES = ['admin', 'office', 'technician'] as const;
export type Role = (typeof ROLES)[number];
