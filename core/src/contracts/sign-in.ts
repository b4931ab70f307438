import type { Role } from '../roles.js';

/** An organisation a person may sign in to, by the name its people know it by. */
export interface OrganisationOption {
  id: string;
  name: string;
}

/** The signed-in membership: who, in which organisation, with which role there. */
export interface SignedInUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  organisationId: string;
  organisationName: string;
  active: boolean;
}

/** `POST /api/auth/sign-in` and `/refresh` when a session begins or goes on. */
export interface SessionTokens {
  accessToken: string;
  refreshToken: string;
  user: SignedInUser;
  /** Every organisation this person may sign in to now, the current one included; more than one offers a switch. */
  organisations: OrganisationOption[];
}

/**
 * `POST /api/auth/sign-in` when the password is right and the person works for more than one organisation and has
 * not chosen: no session yet, only the choice. Sent again with `organisationId` it begins the session there.
 */
export interface OrganisationChoice {
  chooseOrganisation: OrganisationOption[];
}

export type SignInAnswer = SessionTokens | OrganisationChoice;

export const isOrganisationChoice = (answer: SignInAnswer): answer is OrganisationChoice => 'chooseOrganisation' in answer;
