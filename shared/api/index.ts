// The HTTP contract between the client and the server: request/response schemas, types and role capabilities.
export * from './common';
export * from './roles';
export * from './errors';
export * from './auth';
export * from './workshops';
export * from './projects';
export * from './frames';
export * from './invitations';
export * from './sharing';
export * from './activity';
export * from './bin';
