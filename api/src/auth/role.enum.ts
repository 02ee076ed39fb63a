/** The four kinds of user. Values are what the API and the database store. */
export enum Role {
  Admin = 'admin',
  Consultant = 'consultant',
  Checker = 'checker',
  OwnerRep = 'owner-rep',
}

export const ROLES: readonly Role[] = [Role.Admin, Role.Consultant, Role.Checker, Role.OwnerRep];

/** Each role in words, for mail and messages (the API's values are never shown to people). */
export const ROLE_NAMES: Readonly<Record<Role, string>> = {
  [Role.Admin]: 'Admin',
  [Role.Consultant]: 'Consultant',
  [Role.Checker]: 'Checker',
  [Role.OwnerRep]: 'Owner’s representative',
};
