import type { ReactElement } from 'react';
import Svg, { Path, Rect } from 'react-native-svg';

export type NavIconName = 'studyAreas' | 'team' | 'account' | 'outbox' | 'admin';

export type NavIconProps = { name: NavIconName; color: string; size?: number };

/** Line icons for the navigation, drawn on a 24-unit grid. Decorative: the label names the link. */
export function NavIcon({ name, color, size = 22 }: NavIconProps): ReactElement {
  const stroke = { stroke: color, strokeWidth: 1.8, fill: 'none', strokeLinecap: 'round', strokeLinejoin: 'round' } as const;
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      {name === 'studyAreas' ? (
        <>
          <Path d="M4 6.5 9 4l6 2.5L20 4v13.5L15 20l-6-2.5L4 20z" {...stroke} />
          <Rect x={10.5} y={9} width={3} height={3} fill={color} />
          <Rect x={10.5} y={13} width={3} height={3} fill={color} opacity={0.5} />
        </>
      ) : null}
      {name === 'team' ? (
        <>
          <Path d="M9 11a3 3 0 1 0 0-6 3 3 0 0 0 0 6zM3.5 19c.6-3 2.8-5 5.5-5s4.9 2 5.5 5" {...stroke} />
          <Path d="M16 11a2.5 2.5 0 1 0 0-5M17.5 14.2c1.6.6 2.7 2.2 3 4.8" {...stroke} />
        </>
      ) : null}
      {name === 'account' ? (
        <Path d="M12 12a4 4 0 1 0 0-8 4 4 0 0 0 0 8zM5 20c.8-3.6 3.6-6 7-6s6.2 2.4 7 6" {...stroke} />
      ) : null}
      {name === 'outbox' ? (
        <>
          <Rect x={3.5} y={5.5} width={17} height={13} rx={2} {...stroke} />
          <Path d="m4 7 8 6 8-6" {...stroke} />
        </>
      ) : null}
      {name === 'admin' ? (
        <Path d="M12 3.5 19 6v5.5c0 4.2-2.9 7.4-7 9-4.1-1.6-7-4.8-7-9V6zM9 12l2 2 4-4" {...stroke} />
      ) : null}
    </Svg>
  );
}
