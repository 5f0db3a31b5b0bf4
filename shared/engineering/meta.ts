// Shown on every screen and report that uses these checks, and stamped on saved results so an
// old result can be traced to the rules that produced it.
export const engineeringVersion = '1.0.0';

export const engineeringCaution =
  'These checks assist a licensed engineer. They do not replace the engineer of record, the sealed plans or local codes.';
