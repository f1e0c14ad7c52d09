export * from './people';
export * from './projects';
