import type { ReactNode } from 'react';

// Plain DOM SVG for the icons and the mark on the web (see line-svg.tsx): the same props, drawn by the
// browser, without react-native-svg's web layer on the first screen.

type Stroke = {
  stroke?: string;
  strokeWidth?: number;
  strokeLinecap?: 'butt' | 'round' | 'square';
  strokeLinejoin?: 'miter' | 'round' | 'bevel';
};

export function Svg(props: {
  width: number;
  height: number;
  viewBox: string;
  fill?: string;
  'aria-hidden'?: boolean;
  children?: ReactNode;
}) {
  return <svg {...props} style={{ flexShrink: 0 }} />;
}

export function Path(props: Stroke & { d: string }) {
  return <path {...props} />;
}

export function Circle(props: Stroke & { cx: number; cy: number; r: number }) {
  return <circle {...props} />;
}
