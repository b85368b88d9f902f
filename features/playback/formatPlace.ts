/** "42.71819° N, 118.45917° W" — degrees with the hemisphere, five decimals (about 1 m). */
export function formatLatLon(lat: number, lon: number): string {
  return `${Math.abs(lat).toFixed(5)}° ${lat < 0 ? 'S' : 'N'}, ${Math.abs(lon).toFixed(5)}° ${lon < 0 ? 'W' : 'E'}`;
}

/** "1 step", "15 steps", "1.5 years". */
export function plural(count: number, unit: string): string {
  const shown = Number.isInteger(count) ? String(count) : count.toFixed(1);
  return `${shown} ${unit}${count === 1 ? '' : 's'}`;
}
