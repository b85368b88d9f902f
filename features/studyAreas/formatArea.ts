import type { AreaUnit } from '@/shared/schemas';

/** m² per unit: 1 ha = 10,000 m²; 1 international acre = 4,046.8564224 m² (NIST Handbook 44, App. C). */
export const SQUARE_METRES_PER: Record<AreaUnit, number> = { ha: 10_000, acres: 4_046.8564224 };

const UNIT_LABEL: Record<AreaUnit, string> = { ha: 'ha', acres: 'acres' };

const grouped = (digits: number): Intl.NumberFormat =>
  new Intl.NumberFormat('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
const formats = [grouped(0), grouped(1), grouped(2)] as const;

/** Fewer decimals for bigger areas: 3,512 ha · 96.4 ha · 0.25 ha. */
function decimalsFor(value: number): 0 | 1 | 2 {
  const size = Math.abs(value);
  if (size >= 1000) return 0;
  return size >= 10 ? 1 : 2;
}

/** An area in m² in the person's unit, with the unit: "3,512 ha", "8,678 acres". */
export function formatArea(areaM2: number, unit: AreaUnit): string {
  const value = areaM2 / SQUARE_METRES_PER[unit];
  return `${formats[decimalsFor(value)].format(value)} ${UNIT_LABEL[unit]}`;
}

/** A whole number with thousands separators: "14,032". */
export function formatCount(count: number): string {
  return formats[0].format(count);
}

/** A length in metres: "250 m", "1,000 m". */
export function formatMetres(metres: number): string {
  return `${formatCount(metres)} m`;
}

/** A share as a percentage with one decimal: "37.5 %". */
export function formatPercent(share: number): string {
  return `${formats[1].format(share * 100)} %`;
}

/** A file size: "18.2 kB", "1.4 MB". */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} B`;
  return bytes < 1_000_000 ? `${formats[1].format(bytes / 1000)} kB` : `${formats[1].format(bytes / 1_000_000)} MB`;
}

const thousandths = grouped(3);

/** A signed relative difference to a thousandth of a percent: "+0.040 %", "−1.200 %". */
export function formatDifference(value: number, reference: number): string {
  const percent = ((value - reference) / reference) * 100;
  const shown = thousandths.format(Math.abs(percent));
  const sign = Number(shown) === 0 ? '±' : percent > 0 ? '+' : '−';
  return `${sign}${shown} %`;
}
