import type { ReactElement } from 'react';
import Svg, { Rect } from 'react-native-svg';

import { colors, coverPalette } from './theme';

export type PatchMarkProps = { size?: number; muted?: boolean };

/** Patchcast's mark: a clipped grid of patches in cover-state colours. Decorative. */
const cells: ReadonlyArray<{ col: number; row: number; color: string }> = [
  { col: 1, row: 0, color: coverPalette[2] },
  { col: 2, row: 0, color: coverPalette[2] },
  { col: 0, row: 1, color: coverPalette[0] },
  { col: 1, row: 1, color: coverPalette[2] },
  { col: 2, row: 1, color: coverPalette[3] },
  { col: 0, row: 2, color: coverPalette[0] },
  { col: 1, row: 2, color: coverPalette[1] },
];

export function PatchMark({ size = 28, muted = false }: PatchMarkProps): ReactElement {
  const cell = 10;
  const gap = 2;
  return (
    <Svg width={size} height={size} viewBox="0 0 34 34" aria-hidden>
      {cells.map(({ col, row, color }) => (
        <Rect
          key={`${col}-${row}`}
          x={col * (cell + gap) + 1}
          y={row * (cell + gap) + 1}
          width={cell}
          height={cell}
          rx={2}
          fill={muted ? colors.line : color}
        />
      ))}
    </Svg>
  );
}
