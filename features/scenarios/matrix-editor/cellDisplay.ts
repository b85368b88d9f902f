/** Long numbers (e.g. after normalising) shown to 4 decimals with "…" while the entry is not being edited; the full value is kept. */
export function shortForm(text: string): string {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || text.replace(/^-?\d*\.?/, '').length <= 4) return text;
  return `${value.toFixed(4)}…`;
}
