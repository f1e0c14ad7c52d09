// @ts-nocheck
export * from './people';
export * from './projects';
export * from './climate';
export * from './audit';
export * from './invites';
export * from './runs';
