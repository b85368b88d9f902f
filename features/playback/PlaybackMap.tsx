import { useId, useMemo, useRef, useState, type ReactElement } from 'react';
import { StyleSheet, View, type GestureResponderEvent, type LayoutChangeEvent } from 'react-native';
import Svg, { ClipPath, Defs, G, Path } from 'react-native-svg';

import { Button } from '@/components/Button';
import { colors, radius, space } from '@/components/theme';
import type { CoverState } from '@/shared/schemas';
import { outlinePath } from '@/features/studyAreas/drawing';

import type { MapDrawing } from './mapDrawing';
import { statePaths } from './mapPaths';
import { patchAt } from './patchGeometry';
import { PatchLayer } from './PatchLayer';
import { useWheelZoom } from './useWheelZoom';
import { fullView, panView, zoomView, type ViewBox } from './viewBox';

export type PlaybackMapProps = {
  drawing: MapDrawing;
  coverStates: readonly CoverState[];
  /** Patch states at the shown step; undefined while the first frame loads. */
  states: Uint8Array | undefined;
  selectedPatch: number | null;
  onSelectPatch: (patch: number | null) => void;
  label: string;
};

/** A press that moves less than this (px) is a tap on a patch, not a drag. */
const TAP_SLOP = 6;

/** The patches coloured by state (see PatchLayer), clipped to the outline drawn over them; tap a patch, drag to pan, zoom. */
export function PlaybackMap({ drawing, coverStates, states, selectedPatch, onSelectPatch, label }: PlaybackMapProps): ReactElement {
  const { frame, spec, cells } = drawing;
  const clipId = `patches-${useId().replace(/[^A-Za-z0-9_-]/g, '')}`;
  const full = useMemo(() => fullView(frame.width, frame.height), [frame]);
  const [view, setView] = useState<ViewBox>(full);
  const [widthPx, setWidthPx] = useState(0);
  const box = useRef<View>(null);
  useWheelZoom(box, (factor) => setView((current) => zoomView(current, factor, full)));
  const drag = useRef<{ x: number; y: number; view: ViewBox; moved: boolean } | null>(null);
  const outline = useMemo(() => outlinePath(drawing.parts, frame), [drawing.parts, frame]);
  const selected = useMemo(() => (selectedPatch === null ? null : statePaths(cells.subarray(selectedPatch, selectedPatch + 1), new Uint8Array(1), 1, spec, frame)[0]), [cells, selectedPatch, spec, frame]);

  const unitsPerPx = widthPx > 0 ? view.width / widthPx : 1;
  const onLayout = (event: LayoutChangeEvent): void => setWidthPx(event.nativeEvent.layout.width);
  const onGrant = (event: GestureResponderEvent): void => {
    drag.current = { x: event.nativeEvent.pageX, y: event.nativeEvent.pageY, view, moved: false };
  };
  const onMove = (event: GestureResponderEvent): void => {
    const start = drag.current;
    if (!start) return;
    const dx = event.nativeEvent.pageX - start.x;
    const dy = event.nativeEvent.pageY - start.y;
    if (!start.moved && Math.hypot(dx, dy) < TAP_SLOP) return;
    start.moved = true;
    setView(panView(start.view, -dx * unitsPerPx, -dy * unitsPerPx, full));
  };
  const onRelease = (event: GestureResponderEvent): void => {
    const start = drag.current;
    drag.current = null;
    if (!start || start.moved) return;
    const sx = view.x + event.nativeEvent.locationX * unitsPerPx;
    const sy = view.y + event.nativeEvent.locationY * unitsPerPx;
    onSelectPatch(patchAt(sx, sy, cells, spec, frame));
  };

  return (
    <View style={styles.wrap}>
      <View
        ref={box}
        role="img"
        aria-label={label}
        style={[styles.box, { aspectRatio: frame.width / frame.height }]}
        onLayout={onLayout}
        onStartShouldSetResponder={() => true}
        onMoveShouldSetResponder={() => true}
        onResponderGrant={onGrant}
        onResponderMove={onMove}
        onResponderRelease={onRelease}
        testID="playback-map"
      >
        <Svg width="100%" height="100%" viewBox={`${view.x} ${view.y} ${view.width} ${view.height}`} pointerEvents="none">
          <Path d={outline} fill={colors.sand} fillRule="evenodd" />
          <Defs>
            <ClipPath id={clipId}>
              <Path d={outline} fillRule="evenodd" clipRule="evenodd" />
            </ClipPath>
          </Defs>
          <G clipPath={`url(#${clipId})`}>{states ? <PatchLayer drawing={drawing} coverStates={coverStates} states={states} /> : null}</G>
          <Path d={outline} fill="none" stroke={colors.basalt} strokeWidth={1.5 * unitsPerPx} strokeLinejoin="round" fillRule="evenodd" />
          {selected ? <Path d={selected} fill="none" stroke={colors.basalt} strokeWidth={Math.max(1.5, 3 * unitsPerPx)} /> : null}
        </Svg>
      </View>
      <View style={styles.zoom}>
        <Button size="sm" variant="secondary" label="Zoom in" onPress={() => setView(zoomView(view, 1.6, full))} />
        <Button size="sm" variant="secondary" label="Zoom out" onPress={() => setView(zoomView(view, 1 / 1.6, full))} disabled={view.width >= full.width} />
        <Button size="sm" variant="ghost" label="Whole area" onPress={() => setView(full)} disabled={view.width >= full.width} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  box: { width: '100%', backgroundColor: colors.white, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, overflow: 'hidden', cursor: 'pointer' },
  zoom: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
