// Tessera's own palette: mosaic tones — deep slate ink, warm sand paper, terracotta accent,
// olive for "present", ochre for caution. One place for colours, spacing and type.
export const palette = {
  light: {
    background: '#F4EFE6',
    surface: '#FFFDF8',
    surfaceAlt: '#EAE3D6',
    text: '#22303A',
    textMuted: '#5C6770',
    border: '#D5CBBB',
    accent: '#B5553C',
    accentText: '#FFFFFF',
    positive: '#5E7A2E',
    caution: '#A8741A',
    cautionBg: '#FBF0D9',
    danger: '#A33A3A',
    plotMixture: '#22303A',
    plotFit: '#B5553C',
    plotResidual: '#8A8F94',
    plotC1: '#3F7CA6',
    plotC2: '#5E7A2E',
    plotC3: '#8C4F9A',
    plotC4: '#C48A1C',
    plotC5: '#2E8C82',
    plotC6: '#9A4A5E',
    plotSelect: '#B5553C33',
  },
  dark: {
    background: '#161D22',
    surface: '#1F282F',
    surfaceAlt: '#28333B',
    text: '#EDE7DC',
    textMuted: '#A5ADB3',
    border: '#38444D',
    accent: '#D9785D',
    accentText: '#161D22',
    positive: '#9DBB62',
    caution: '#E0AE52',
    cautionBg: '#3A3020',
    danger: '#E07272',
    plotMixture: '#EDE7DC',
    plotFit: '#D9785D',
    plotResidual: '#7D858B',
    plotC1: '#7FB3D9',
    plotC2: '#9DBB62',
    plotC3: '#C49AD1',
    plotC4: '#E0AE52',
    plotC5: '#6CC7BC',
    plotC6: '#D98CA0',
    plotSelect: '#D9785D44',
  },
} as const;

export type ThemeColours = { [K in keyof (typeof palette)['light']]: string };

export const spacing = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;
export const radius = { sm: 4, md: 8, lg: 14 } as const;

export const fonts = {
  regular: 'Inter_400Regular',
  medium: 'Inter_500Medium',
  semibold: 'Inter_600SemiBold',
  bold: 'Inter_700Bold',
} as const;

export const fontSize = { xs: 12, sm: 14, md: 16, lg: 19, xl: 24, xxl: 30 } as const;

/** Width from which the app switches to side navigation and two panes. */
export const WIDE_BREAKPOINT = 1024;

/** Component traces of the overlay plot take these in turn. */
export const COMPONENT_COLOUR_KEYS = ['plotC1', 'plotC2', 'plotC3', 'plotC4', 'plotC5', 'plotC6'] as const;
