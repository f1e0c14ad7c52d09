/** Which hours the morphing held at a bound of RH, in words; none when it held none. */
export function rhBoundedNote(heldAt100: number, heldAt0: number): string {
  if (heldAt100 + heldAt0 === 0) return 'none: every morphed hour stayed between 0 and 100 % RH';
  const h = (n: number) => `${n.toLocaleString('en')} ${n === 1 ? 'hour' : 'hours'}`;
  return [heldAt100 > 0 ? `${h(heldAt100)} held at 100 %` : null, heldAt0 > 0 ? `${h(heldAt0)} held at 0 %` : null].filter(Boolean).join(', ');
}
