/** Button looks shared by the upload steps. */
export const button = 'rounded bg-harbour px-4 py-2 text-sm text-paper hover:bg-harbour-soft disabled:cursor-not-allowed disabled:opacity-50';
export const quietButton = 'rounded border border-rule bg-panel px-4 py-2 text-sm hover:bg-mist';
