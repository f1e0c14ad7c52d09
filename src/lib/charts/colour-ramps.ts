/**
 * Tramontane's sequential colour ramps for continuous values (mode colours live in shared/modes.ts).
 * Piecewise-linear in sRGB between our own stops; t in 0…1, clamped.
 */
function ramp(stops: string[]): (t: number) => string {
  const rgb = stops.map((hex) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)));
  return (t: number) => {
    const x = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0)) * (rgb.length - 1);
    const i = Math.min(rgb.length - 2, Math.floor(x));
    const f = x - i;
    const [r, g, b] = rgb[i].map((c, k) => Math.round(c + (rgb[i + 1][k] - c) * f));
    return `rgb(${r}, ${g}, ${b})`;
  };
}

/** Cold slate blue through pale sand to brick: air temperatures. */
export const temperatureRamp = ramp(['#27496d', '#5f8fb0', '#b9d3df', '#efe8d2', '#e4b067', '#c0662f', '#7e2a1c']);

/** Pale mist to deep harbour: how many hours fall in a cell. */
export const densityRamp = ramp(['#dfe9ed', '#9dbccb', '#4f8098', '#1f3a4a', '#0d1c25']);
