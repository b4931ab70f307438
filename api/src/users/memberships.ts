import type { OrganisationOption, SignedInUser } from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { User } from './entities/user.entity.js';

/** One organisation a person may sign in to now, with the membership that says who they are there. */
export interface Membership {
  user: User;
  organisation: OrganisationOption;
}

/** A person's active memberships, by organisation name: what they may choose from at sign-in. */
export async function activeMemberships(em: EntityManager, personId: string): Promise<Membership[]> {
  const users = await em.findBy(User, { personId, active: true });
  if (users.length === 0) return [];
  const organisations = await em.find(Organisation, { where: { id: In(users.map((u) => u.organisationId)) }, select: { id: true, name: true } });
  const names = new Map(organisations.map((o) => [o.id, o.name]));
  return users
    .filter((u) => names.has(u.organisationId))
    .map((user) => ({ user, organisation: { id: user.organisationId, name: names.get(user.organisationId)! } }))
    .sort((a, b) => a.organisation.name.localeCompare(b.organisation.name, 'en-GB') || a.organisation.id.localeCompare(b.organisation.id));
}

export function signedInUser({ user, organisation }: Membership): SignedInUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role, organisationId: user.organisationId, organisationName: organisation.name, active: user.active };
}
