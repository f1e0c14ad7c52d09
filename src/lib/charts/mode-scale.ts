import { modeColours, modeKeys, modeLabels } from '../../../shared/modes';

/** The modes' names in palette order: a chart's stacking order, and the domain of its colour scale. */
export const modeLabelOrder = modeKeys.map((k) => modeLabels[k]);

/** Plot's colour scale for marks filled by mode name: the one palette of shared/modes.ts. */
export const modeColourScale = { domain: modeLabelOrder, range: modeKeys.map((k) => modeColours[k]) };
