/**
 * Tributary's design tokens. Every colour, space and type size used by the client comes from here.
 * Palette: ink blue-black on warm paper with one accent (river teal); contrast is kept at or above
 * 7:1 for text so screens read in sunlight.
 */

export const colors = {
  ink: '#14202B',
  inkMuted: '#45505C',
  paper: '#F6F1E7',
  surface: '#FFFCF6',
  surfaceSunken: '#EDE6D8',
  line: '#CDC3B1',
  lineStrong: '#6D6557',
  accent: '#0D5C63',
  accentPressed: '#093F44',
  accentSoft: '#DCEBEA',
  onAccent: '#FFFFFF',
  danger: '#9E2A1E',
  dangerSoft: '#F7E1DC',
  warning: '#6E4A00',
  warningSoft: '#F6E8C6',
  success: '#1E5E34',
  successSoft: '#DDEDDF',
  info: '#1F4670',
  infoSoft: '#E0E8F2',
  focus: '#0D5C63',
  overlay: 'rgba(20, 32, 43, 0.08)',
  none: 'transparent',
} as const;
export type ColorToken = keyof typeof colors;

export const spacing = {
  xxs: 2,
  xs: 4,
  sm: 8,
  md: 12,
  lg: 16,
  xl: 24,
  xxl: 32,
  xxxl: 48,
} as const;
export type SpacingToken = keyof typeof spacing;

export const radii = { sm: 6, md: 10, lg: 14, pill: 999 } as const;

export const fonts = {
  regular: 'Inter_400Regular',
  medium: 'Inter_500Medium',
  semibold: 'Inter_600SemiBold',
  bold: 'Inter_700Bold',
} as const;

/** Type scale: font size and line height in px, and the Inter weight each step uses. */
export const typeScale = {
  display: { fontSize: 30, lineHeight: 36, fontFamily: fonts.bold },
  title: { fontSize: 22, lineHeight: 28, fontFamily: fonts.semibold },
  heading: { fontSize: 18, lineHeight: 24, fontFamily: fonts.semibold },
  body: { fontSize: 17, lineHeight: 25, fontFamily: fonts.regular },
  bodyStrong: { fontSize: 17, lineHeight: 25, fontFamily: fonts.semibold },
  label: { fontSize: 15, lineHeight: 20, fontFamily: fonts.semibold },
  caption: { fontSize: 14, lineHeight: 20, fontFamily: fonts.regular },
  mono: { fontSize: 14, lineHeight: 20, fontFamily: fonts.medium },
} as const;
export type TypeVariant = keyof typeof typeScale;

export const layout = {
  /** Smallest tappable height/width, px. */
  touchTarget: 48,
  /** Width at and above which the side navigation replaces the bottom tabs, px. */
  wideBreakpoint: 768,
  sideNavWidth: 232,
  contentMaxWidth: 720,
  formMaxWidth: 480,
  tabBarHeight: 64,
} as const;

export const iconSize = { sm: 18, md: 22, lg: 28 } as const;
