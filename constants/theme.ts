/*
 * Loftline's look: deep ink on warm field-notebook paper, one cobalt "signal" colour for actions,
 * throw-line orange for the brand mark and the current place in the navigation, and three safety
 * colours that always travel with a word and an icon (see constants/states.ts).
 *
 * Contrast was chosen for sunlight: body text ink on paper is about 15:1, muted text about 8:1 (WCAG AAA
 * needs 7:1), borders of controls at least 3:1 (WCAG 2.1 SC 1.4.11). No text is lighter than `inkMuted`.
 */

export const colors = {
  paper: '#F5EFE3',
  surface: '#FFFCF6',
  surfaceSunk: '#EAE1CF',
  ink: '#141C24',
  inkMuted: '#3A4550',
  /** Borders of inputs and cards: 3:1 or better against paper and surface. */
  line: '#7C7160',
  lineSoft: '#CFC4AF',
  action: '#1446A0',
  actionPressed: '#0E3478',
  onAction: '#FFFFFF',
  brand: '#E0570F',
  brandInk: '#9A3A05',
  focus: '#E0570F',
  danger: '#A4221B',
  dangerSoft: '#FBE3DF',
  warning: '#7A4F00',
  warningSoft: '#FFEBB8',
  ok: '#1C6431',
  okSoft: '#DDF1E0',
  info: '#1446A0',
  infoSoft: '#DFE8F8',
  shellBar: '#141C24',
  onShellBar: '#F5EFE3',
  onShellBarMuted: '#C9C0AE',
} as const;

export const spacing = { xxs: 2, xs: 4, s: 8, m: 12, l: 16, xl: 24, xxl: 32, xxxl: 48 } as const;
export const radii = { s: 6, m: 10, l: 16, pill: 999 } as const;

/** Every control is at least this tall and wide (WCAG 2.5.5 target size 44 px; we use 48 for gloved hands). */
export const touchTargetPx = 48;

export const fonts = {
  regular: 'Inter_400Regular',
  medium: 'Inter_500Medium',
  semibold: 'Inter_600SemiBold',
  bold: 'Inter_700Bold',
  mono: 'JetBrainsMono_400Regular',
  monoBold: 'JetBrainsMono_700Bold',
} as const;

/** Type scale in px; nothing smaller than 14 and no weight under 400. */
export const type = {
  caption: { fontFamily: fonts.medium, fontSize: 14, lineHeight: 20 },
  body: { fontFamily: fonts.regular, fontSize: 17, lineHeight: 25 },
  bodyStrong: { fontFamily: fonts.semibold, fontSize: 17, lineHeight: 25 },
  label: { fontFamily: fonts.semibold, fontSize: 15, lineHeight: 20 },
  title: { fontFamily: fonts.bold, fontSize: 20, lineHeight: 27 },
  heading: { fontFamily: fonts.bold, fontSize: 26, lineHeight: 32 },
  display: { fontFamily: fonts.bold, fontSize: 34, lineHeight: 40 },
  mono: { fontFamily: fonts.mono, fontSize: 16, lineHeight: 24 },
} as const;
export type TypeVariant = keyof typeof type;

export const breakpoints = {
  /** At and above this width the shell shows a side navigation and screens may show two panes. */
  wideMinPx: 900,
  /** Content column width on wide screens. */
  contentMaxPx: 1120,
  formMaxPx: 560,
  sideNavPx: 248,
} as const;

export const shadow = {
  card: { shadowColor: '#141C24', shadowOpacity: 0.08, shadowRadius: 6, shadowOffset: { width: 0, height: 2 } },
} as const;
