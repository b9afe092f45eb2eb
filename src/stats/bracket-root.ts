/**
 * Root of a function inside a bracket, by the Illinois variant of regula falsi (Dowell & Jarratt
 * 1971, BIT 11:168–174; from memory): it keeps the root bracketed like bisection but converges
 * superlinearly, because the end that stays put has its value halved. A step that would leave the
 * bracket (rounding at a very narrow bracket) is a bisection step.
 */

/** The bracket left when `illinois` stops: f(lo) < 0 ≤ f(hi), or lo = hi at an exact zero. */
export interface Bracket {
  lo: number;
  hi: number;
}

/**
 * Narrows [lo, hi], given f(lo) = fLo < 0 ≤ fHi = f(hi), until hi − lo ≤ relTol·|hi|, an exact
 * zero is met (then lo = hi = that point), or after maxSteps evaluations of f.
 */
export function illinois(
  f: (x: number) => number,
  lo: number,
  fLo: number,
  hi: number,
  fHi: number,
  relTol: number,
  maxSteps: number,
): Bracket {
  let side = 0;
  for (let i = 0; i < maxSteps && hi - lo > relTol * Math.abs(hi); i++) {
    let mid = (lo * fHi - hi * fLo) / (fHi - fLo);
    if (!(mid > lo && mid < hi)) mid = lo + (hi - lo) / 2;
    const fMid = f(mid);
    if (fMid === 0) return { lo: mid, hi: mid };
    if (fMid < 0) {
      lo = mid;
      fLo = fMid;
      if (side === -1) fHi /= 2;
      side = -1;
    } else {
      hi = mid;
      fHi = fMid;
      if (side === 1) fLo /= 2;
      side = 1;
    }
  }
  return { lo, hi };
}
