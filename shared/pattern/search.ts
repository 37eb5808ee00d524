/* Small 1-D numerical tools for the pattern summary: Brent's minimiser and an Illinois root finder. */

const GOLD = 0.381966011250105;

/** Brent's method (R. P. Brent, "Algorithms for Minimization without Derivatives", 1973): x in [a, b] minimising f. */
export function brentMinimize(f: (x: number) => number, a: number, b: number, tol: number, maxIter = 60): { x: number; fx: number } {
  let x = a + GOLD * (b - a);
  let w = x, v = x;
  let fx = f(x), fw = fx, fv = fx;
  let d = 0, e = 0;
  for (let it = 0; it < maxIter; it++) {
    const m = (a + b) / 2;
    const tol1 = tol + 1e-12 * Math.abs(x);
    const tol2 = 2 * tol1;
    if (Math.abs(x - m) <= tol2 - (b - a) / 2) break;
    let useGolden = true;
    if (Math.abs(e) > tol1) {
      let r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      r = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q;
        const u = x + d;
        if (u - a < tol2 || b - u < tol2) d = x < m ? tol1 : -tol1;
        useGolden = false;
      }
    }
    if (useGolden) {
      e = (x < m ? b : a) - x;
      d = GOLD * e;
    }
    const u = Math.abs(d) >= tol1 ? x + d : x + (d > 0 ? tol1 : -tol1);
    const fu = f(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w; fv = fw; w = x; fw = fx; x = u; fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w; fv = fw; w = u; fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u; fv = fu;
      }
    }
  }
  return { x, fx };
}

/** Root of f in [a, b] where f(a) and f(b) differ in sign (Illinois variant of regula falsi). */
export function illinoisRoot(f: (x: number) => number, a: number, b: number, tol: number, fa = f(a), fb = f(b), maxIter = 60): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  let side = 0;
  let c = a;
  for (let it = 0; it < maxIter; it++) {
    c = (a * fb - b * fa) / (fb - fa);
    const fc = f(c);
    if (Math.abs(b - a) < tol || fc === 0) return c;
    if (fc * fb > 0) {
      b = c; fb = fc;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = c; fa = fc;
      if (side === 1) fb /= 2;
      side = 1;
    }
    if (Math.abs(b - a) < tol) return (a + b) / 2;
  }
  return c;
}
