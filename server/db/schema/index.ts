export * from './invitations';
export * from './memberships';
export * from './organisations';
export * from './role-enum';
export * from './sessions';
export * from './users';
