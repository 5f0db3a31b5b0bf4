// The keyboard focus ring on the web. Chromium's own ring is a thin 1 px line that disappears
// against the slate navigation, so every focusable element gets a 3 px ring instead, drawn only
// for keyboard focus (:focus-visible), in a colour at least 3:1 against what surrounds it.
import { Platform } from 'react-native';
import { colors } from './theme';

// The dark areas of the shell, named by the test ids they already carry.
const darkAreas = ['nav-side', 'shell-bar'];

export const focusRingCss = [
  `:focus-visible { outline: 3px solid ${colors.slate} !important; outline-offset: 2px; }`,
  `${darkAreas.map((id) => `[data-testid="${id}"] :focus-visible`).join(', ')} { outline-color: ${colors.slateLight} !important; }`,
  // The bottom tabs touch the window's edges, where a ring drawn outside would be cut off.
  `[data-testid="nav-tabs"] :focus-visible { outline-offset: -3px; }`,
].join('\n');

let installed = false;

export function installFocusRing() {
  if (installed || Platform.OS !== 'web' || typeof document === 'undefined') return;
  installed = true;
  const style = document.createElement('style');
  style.setAttribute('data-spanrelay', 'focus-ring');
  style.textContent = focusRingCss;
  document.head.appendChild(style);
}
