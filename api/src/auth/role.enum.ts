/** The four kinds of user. Values are what the API and the database store. */
export enum Role {
  Admin = 'admin',
  Consultant = 'consultant',
  Checker = 'checker',
  OwnerRep = 'owner-rep',
}

export const ROLES: readonly Role[] = [Role.Admin, Role.Consultant, Role.Checker, Role.OwnerRep];
