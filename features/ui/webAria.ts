// aria-current tells a screen reader which link is the page it is on (or which card is the one
// shown beside the list). react-native-web writes it to the page; React Native's prop types lack
// it, so it is spread on as a plain object.
export function ariaCurrent(current: boolean, kind: 'page' | 'true' = 'page'): object {
  return current ? { 'aria-current': kind } : {};
}
