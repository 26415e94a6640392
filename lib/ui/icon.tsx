import { memo } from 'react';
import { Circle, Path, Svg } from './line-svg';
import { colors, iconSize } from '@/lib/theme';

const paths = {
  jobs: ['M3 11 12 4l9 7', 'M5 10v10h14V10', 'M10 20v-6h4v6'],
  members: [
    'M9 11a3.5 3.5 0 1 0 0-7 3.5 3.5 0 0 0 0 7Z',
    'M2.5 20c.6-3.6 3.2-5.5 6.5-5.5s5.9 1.9 6.5 5.5',
    'M16 4.3a3.5 3.5 0 0 1 0 6.4',
    'M18 14.8c2 .7 3.2 2.5 3.5 5.2',
  ],
  account: ['M12 12a4 4 0 1 0 0-8 4 4 0 0 0 0 8Z', 'M4 21c.8-4.2 4-6.5 8-6.5s7.2 2.3 8 6.5'],
  spanTable: ['M4 4h16v16H4z', 'M4 9.5h16', 'M4 14.5h16', 'M9.5 4v16'],
  requests: ['M3 13.5 5.5 5h13l2.5 8.5V19H3v-5.5Z', 'M3 13.5h5l1.5 2.5h5l1.5-2.5h5'],
  mail: ['M3 6h18v12H3z', 'm3 7 9 6.5L21 7'],
  check: ['m5 12.5 4.5 4.5L19 7.5'],
  warning: ['M12 3.5 2.5 20h19L12 3.5Z', 'M12 10v4.5', 'M12 17.2v.3'],
  error: ['M15 9l-6 6', 'm9 9 6 6'],
  info: ['M12 11v6', 'M12 7.5v.3'],
  plus: ['M12 5v14', 'M5 12h14'],
  chevronRight: ['m9 5 7 7-7 7'],
  chevronLeft: ['m15 5-7 7 7 7'],
  archive: ['M3 4h18v4H3z', 'M5 8v12h14V8', 'M10 12h4'],
  signOut: ['M14 4H5v16h9', 'M10 12h11', 'm17 8 4 4-4 4'],
  edit: ['M4 20h4L19 9l-4-4L4 16v4Z', 'm13.5 6.5 4 4'],
  lock: ['M6 11h12v9H6z', 'M8.5 11V8a3.5 3.5 0 0 1 7 0v3'],
  priceBook: ['M5 3h11l3 3v15H5z', 'M9 9h6', 'M9 13h6', 'M9 17h3'],
  swap: ['M4 8h14', 'm15 5 3 3-3 3', 'M20 16H6', 'm9 13-3 3 3 3'],
  device: ['M7 3h10v18H7z', 'M11 18h2'],
  sync: ['M20 11a8 8 0 0 0-14.5-4.5', 'M4 4v3.5h3.5', 'M4 13a8 8 0 0 0 14.5 4.5', 'M20 20v-3.5h-3.5'],
  online: [
    'M2.5 9a14 14 0 0 1 19 0',
    'M5.5 12.5a9.5 9.5 0 0 1 13 0',
    'M8.8 16a5 5 0 0 1 6.4 0',
    'M12 19.5v.2',
  ],
  offline: ['M2.5 9a14 14 0 0 1 19 0', 'M5.5 12.5a9.5 9.5 0 0 1 13 0', 'M12 19.5v.2', 'M3 3l18 18'],
} as const;

/** Icons drawn with a circle behind their strokes. */
const circled: ReadonlySet<IconName> = new Set(['error', 'info']);

export type IconName = keyof typeof paths;

type IconProps = {
  name: IconName;
  size?: number;
  color?: string;
};

function IconView({ name, size = iconSize.md, color = colors.ink }: IconProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none" aria-hidden>
      {circled.has(name) ? <Circle cx={12} cy={12} r={9} stroke={color} strokeWidth={2} /> : null}
      {paths[name].map((d) => (
        <Path key={d} d={d} stroke={color} strokeWidth={2} strokeLinecap="round" strokeLinejoin="round" />
      ))}
    </Svg>
  );
}

/** Tributary's own line icons (24-unit grid, round strokes). Decorative: pair each with a word. Memoised. */
export const Icon = memo(IconView);
