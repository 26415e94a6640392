import { colors, fonts } from '@/lib/theme';
import type { CurveKind } from './value-text';

/** The diagrams' look, all from the theme's tokens: ink lines on paper, the accent for loads. */
export const diagramLook = {
  ink: colors.ink,
  muted: colors.inkMuted,
  guide: colors.line,
  zeroLine: colors.lineStrong,
  beamFill: colors.surfaceSunken,
  bearingFill: colors.lineStrong,
  loadFill: colors.accentSoft,
  loadStroke: colors.accent,
  arrow: colors.ink,
  chipFill: colors.surface,
  chipStroke: colors.line,
  text: colors.ink,
  none: colors.none,
  fontRegular: fonts.regular,
  fontStrong: fonts.semibold,
} as const;

/** Fill and line of each curve. */
export const curveLook: Record<CurveKind, { fill: string; stroke: string }> = {
  shear: { fill: colors.accentSoft, stroke: colors.accent },
  moment: { fill: colors.infoSoft, stroke: colors.info },
  deflection: { fill: colors.surfaceSunken, stroke: colors.ink },
};
