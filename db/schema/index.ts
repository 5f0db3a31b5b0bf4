export * from './auth';
export * from './projects';
export * from './requests';
export * from './invitations';
