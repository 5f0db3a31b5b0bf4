// Spanrelay's look: slate blue for structure, warm concrete greys, amber only for cautions.
export const colors = {
  ink: '#17242E',
  inkMuted: '#4E5D68',
  slate: '#1F3A4D',
  slateLight: '#DCE6EC',
  slateActive: '#2E5670',
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

// Every text colour the screens set on a background, for the contrast test (tests/unit/contrast.test.ts).
// Add a pair here when a screen puts text of a new colour on a new background.
export const textOnBackground: readonly { where: string; text: string; background: string }[] = [
  { where: 'body text', text: colors.ink, background: colors.surface },
  { where: 'body text on the page', text: colors.ink, background: colors.concrete },
  { where: 'secondary text', text: colors.inkMuted, background: colors.surface },
  { where: 'secondary text on the page', text: colors.inkMuted, background: colors.concrete },
  { where: 'secondary text in a chosen option', text: colors.inkMuted, background: colors.slateLight },
  { where: 'top bar and side navigation', text: colors.surface, background: colors.slate },
  { where: 'signed-in name in the top bar', text: colors.slateLight, background: colors.slate },
  { where: 'active side navigation item', text: colors.surface, background: colors.slateActive },
  { where: 'primary button', text: colors.surface, background: colors.slate },
  { where: 'state pill', text: colors.slate, background: colors.slateLight },
  { where: 'error notice', text: colors.danger, background: colors.dangerBg },
  { where: 'confirmation notice', text: colors.ok, background: colors.okBg },
  { where: 'caution notice', text: colors.caution, background: colors.cautionBg },
  { where: 'information notice', text: colors.slate, background: colors.slateLight },
  { where: 'overdue due date', text: colors.danger, background: colors.surface },
  { where: 'waiting-count badge', text: colors.surface, background: colors.danger },
  { where: 'met condition', text: colors.ok, background: colors.surface },
  { where: 'open condition', text: colors.caution, background: colors.surface },
];

// The keyboard focus ring (features/ui/focusRing.ts) against each background a focusable control
// sits on; WCAG 2.2 1.4.11 (Non-text Contrast, level AA) asks 3:1.
export const focusRingOnBackground: readonly { where: string; ring: string; background: string }[] = [
  { where: 'on the page', ring: colors.slate, background: colors.concrete },
  { where: 'on a card, panel or the bottom tabs', ring: colors.slate, background: colors.surface },
  { where: 'in a chosen option or an information notice', ring: colors.slate, background: colors.slateLight },
  { where: 'in an error notice', ring: colors.slate, background: colors.dangerBg },
  { where: 'in a caution notice', ring: colors.slate, background: colors.cautionBg },
  { where: 'in a confirmation notice', ring: colors.slate, background: colors.okBg },
  { where: 'in the side navigation and the top bar', ring: colors.slateLight, background: colors.slate },
];
