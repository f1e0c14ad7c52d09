export * from './people';
export * from './projects';
export * from './climate';
