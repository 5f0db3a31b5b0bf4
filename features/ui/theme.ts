// Spanrelay's look: slate blue for structure, warm concrete greys, amber only for cautions.
export const colors = {
  ink: '#17242E',
  inkMuted: '#4E5D68',
  slate: '#1F3A4D',
  slateLight: '#DCE6EC',
  concrete: '#F3F1EC',
  surface: '#FFFFFF',
  line: '#D5D2CA',
  caution: '#8A5A00',
  cautionBg: '#FFF4DA',
  danger: '#9B1C1C',
  dangerBg: '#FDECEC',
  ok: '#1E6B3A',
  okBg: '#E5F4EA',
} as const;

export const fonts = {
  regular: 'WorkSans_400Regular',
  medium: 'WorkSans_500Medium',
  semibold: 'WorkSans_600SemiBold',
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;

export const radius = 6;
