/** A share 0–1 as a percentage with one decimal: 0.4512 → "45.1 %". */
export function formatShare(share: number): string {
  return `${(share * 100).toFixed(1)} %`;
}
