// One theme for the whole app: a calm paper-and-ink look of our own. Contrast of every text colour on its
// background is at least 4.5:1 (checked in tests/unit/theme.test.ts with the WCAG 2 formula).
export const colors = {
  background: '#F6F4EF',
  surface: '#FFFFFF',
  surfaceAlt: '#EEEBE3',
  border: '#C9C3B6',
  borderStrong: '#8A8273',
  text: '#1C2B33',
  textMuted: '#4A5A63',
  primary: '#1F4E5F',
  primaryText: '#FFFFFF',
  primarySoft: '#DCE8EC',
  focus: '#C2410C',
  danger: '#A4262C',
  dangerSoft: '#FBE9E9',
  warning: '#8A4B00',
  warningSoft: '#FDF1DC',
  success: '#1E6B3A',
  successSoft: '#E3F2E7',
  note: '#2D4F8A',
  noteSoft: '#E6ECF7',
  added: '#E3F2E7',
  removed: '#FBE9E9',
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;
export const radius = { sm: 4, md: 8, lg: 12 } as const;

/** Below `wide` the app is laid out for a phone: bottom tabs, one column. */
export const breakpoints = { wide: 900, desk: 1200 } as const;
/** Forms and reading text never stretch wider than this. */
export const maxContentWidth = 1040;
export const maxFormWidth = 560;

export const fonts = {
  regular: 'Inter_400Regular',
  semibold: 'Inter_600SemiBold',
  bold: 'Inter_700Bold',
  mono: 'JetBrainsMono_400Regular',
} as const;

export const type = {
  title: { fontFamily: fonts.bold, fontSize: 24, lineHeight: 32, color: colors.text },
  heading: { fontFamily: fonts.semibold, fontSize: 18, lineHeight: 26, color: colors.text },
  body: { fontFamily: fonts.regular, fontSize: 15, lineHeight: 22, color: colors.text },
  small: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 18, color: colors.textMuted },
  label: { fontFamily: fonts.semibold, fontSize: 14, lineHeight: 20, color: colors.text },
  mono: { fontFamily: fonts.mono, fontSize: 13, lineHeight: 19, color: colors.text },
} as const;
