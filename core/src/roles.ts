/**
 * Who a person is to the organisation: the admin manages the team, the office runs jobs and paperwork, a
 * technician works on site. The server's guards and the app's screens both decide by these names.
 */
export const ROLES = ['admin', 'office', 'technician'] as const;
export type Role = (typeof ROLES)[number];
