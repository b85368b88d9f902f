import { useId, useMemo, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { ClipPath, Defs, G, Path } from 'react-native-svg';

import { colors, radius } from '@/components/theme';
import type { GridSpec } from '@/shared/geo/grid';
import type { ProjectedBoundary } from '@/shared/geo/projected-boundary';

import { cellsPath, fitFrame, gridIsDrawable, gridLinesPath, outlinePath } from './drawing';

/** What is drawn over the outline: nothing, the grid's lines, or the patches themselves. */
export type DrawingOverlay = { kind: 'none' } | { kind: 'lines'; spec: GridSpec } | { kind: 'cells'; spec: GridSpec; cells: Int32Array };

export type BoundaryDrawingProps = {
  boundary: Pick<ProjectedBoundary, 'parts' | 'bbox'>;
  overlay: DrawingOverlay;
  /** What the drawing shows, for screen readers. */
  label: string;
};

/** Tallest the drawing gets on a wide screen, px; it keeps its shape and centres. */
const MAX_HEIGHT = 440;

type Paths = { outline: string; lines: string | null; cells: string | null; strokeCells: boolean };

function pathsFor(boundary: BoundaryDrawingProps['boundary'], overlay: DrawingOverlay): Paths & { width: number; height: number } {
  const frame = fitFrame(boundary.bbox);
  const outline = outlinePath(boundary.parts, frame);
  const drawable = overlay.kind !== 'none' && gridIsDrawable(overlay.spec);
  return {
    width: frame.width,
    height: frame.height,
    outline,
    lines: overlay.kind === 'lines' && drawable ? gridLinesPath(overlay.spec, frame) : null,
    // Small grids: every cell its own square, edges stroked. Big grids: rows merged, fill only.
    cells: overlay.kind === 'cells' ? cellsPath(overlay.cells, overlay.spec, frame, !drawable) : null,
    strokeCells: drawable,
  };
}

/** The boundary (north up, fitted to the box) with its grid or patches, each layer a single path. */
export function BoundaryDrawing({ boundary, overlay, label }: BoundaryDrawingProps): ReactElement {
  const clipId = `outline-${useId().replace(/[^A-Za-z0-9_-]/g, '')}`;
  const paths = useMemo(() => pathsFor(boundary, overlay), [boundary, overlay]);
  return (
    <View role="img" aria-label={label} style={[styles.box, { aspectRatio: paths.width / paths.height, maxWidth: (MAX_HEIGHT * paths.width) / paths.height }]}>
      <Svg width="100%" height="100%" viewBox={`0 0 ${paths.width} ${paths.height}`}>
        <Defs>
          <ClipPath id={clipId}>
            <Path d={paths.outline} fillRule="evenodd" clipRule="evenodd" />
          </ClipPath>
        </Defs>
        <Path d={paths.outline} fill={colors.sageTint} fillRule="evenodd" />
        <G clipPath={`url(#${clipId})`}>
          {paths.cells ? (
            <Path d={paths.cells} fill={colors.sage} fillOpacity={0.28} stroke={paths.strokeCells ? colors.sageDark : 'none'} strokeOpacity={0.5} strokeWidth={0.8} />
          ) : null}
          {paths.lines ? <Path d={paths.lines} stroke={colors.sageDark} strokeOpacity={0.45} strokeWidth={0.8} fill="none" /> : null}
        </G>
        <Path d={paths.outline} fill="none" stroke={colors.basalt} strokeWidth={2} strokeLinejoin="round" fillRule="evenodd" />
      </Svg>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: '100%', alignSelf: 'center', backgroundColor: colors.white, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, overflow: 'hidden' },
});
