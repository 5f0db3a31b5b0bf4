// The three-moment equations give one unknown per interior support and touch only neighbours,
// so the system is tridiagonal; the Thomas algorithm solves it in linear time. With spans of
// positive length the matrix is strictly diagonally dominant (2(Li + Li+1) > Li + Li+1), which is
// what makes elimination without pivoting safe here.

/** Solves a[i] x[i-1] + b[i] x[i] + c[i] x[i+1] = d[i]; a[0] and c[n-1] are ignored. */
export function solveTridiagonal(
  a: readonly number[],
  b: readonly number[],
  c: readonly number[],
  d: readonly number[],
): number[] {
  const n = b.length;
  if (n === 0) return [];
  const cp = new Array<number>(n).fill(0);
  const dp = new Array<number>(n).fill(0);
  let denom = b[0]!;
  cp[0] = (c[0] ?? 0) / denom;
  dp[0] = d[0]! / denom;
  for (let i = 1; i < n; i++) {
    denom = b[i]! - a[i]! * cp[i - 1]!;
    cp[i] = i < n - 1 ? c[i]! / denom : 0;
    dp[i] = (d[i]! - a[i]! * dp[i - 1]!) / denom;
  }
  const x = new Array<number>(n).fill(0);
  x[n - 1] = dp[n - 1]!;
  for (let i = n - 2; i >= 0; i--) x[i] = dp[i]! - cp[i]! * x[i + 1]!;
  return x;
}
