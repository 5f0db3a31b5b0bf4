// The theme's text colours against their backgrounds, by the WCAG 2.2 contrast ratio.
import { describe, expect, it } from 'vitest';
import { contrastRatio, relativeLuminance } from '../../../features/ui/contrast';
import { focusRingOnBackground, textOnBackground } from '../../../features/ui/theme';

describe('WCAG contrast ratio', () => {
  it('matches the definition at its end points', () => {
    // WCAG 2.2, "relative luminance": 0 for darkest black, 1 for lightest white; black on white is 21:1.
    expect(relativeLuminance('#000000')).toBe(0);
    expect(relativeLuminance('#FFFFFF')).toBeCloseTo(1, 10);
    expect(contrastRatio('#000000', '#FFFFFF')).toBeCloseTo(21, 10);
    expect(contrastRatio('#FFFFFF', '#FFFFFF')).toBeCloseTo(1, 10);
  });

  it('puts the lightest grey that passes on white at #767676 (4.54:1), and #777777 just under 4.5', () => {
    // Commonly cited accessibility reference value (from memory): #767676 on white is 4.54:1.
    expect(contrastRatio('#767676', '#FFFFFF')).toBeCloseTo(4.54, 2);
    expect(contrastRatio('#777777', '#FFFFFF')).toBeLessThan(4.5);
  });
});

describe('the theme', () => {
  // WCAG 2.2 success criterion 1.4.3 (Contrast, Minimum, level AA): 4.5:1 for normal-size text.
  it.each(textOnBackground)('$where meets 4.5:1', ({ text, background }) => {
    expect(contrastRatio(text, background)).toBeGreaterThanOrEqual(4.5);
  });

  // WCAG 2.2 success criterion 1.4.11 (Non-text Contrast, level AA): 3:1 for a focus indicator.
  it.each(focusRingOnBackground)('the focus ring $where meets 3:1', ({ ring, background }) => {
    expect(contrastRatio(ring, background)).toBeGreaterThanOrEqual(3);
  });
});
