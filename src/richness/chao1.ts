/** Chao1 estimate and its standard deviation. */
export interface Chao1 {
  readonly estimate: number;
  readonly sd: number;
}

/**
 * Bias-corrected Chao1 with the finite-sample factor k = (N − 1) / N (Chao 1984, Scand. J.
 * Statist. 11, 265–270; Chao 1987, Biometrics 43, 783–791; the bias-corrected form as given by
 * Chao 2005, Encyclopedia of Statistical Sciences, and in Colwell's EstimateS user's guide):
 *
 *   S = S_obs + k · f1 (f1 − 1) / (2 (f2 + 1))
 *   var = k · f1 (f1 − 1) / (2 (f2 + 1)) + k² · f1 (2 f1 − 1)² / (4 (f2 + 1)²)
 *         + k² · f1² f2 (f1 − 1)² / (4 (f2 + 1)⁴)
 *
 * The f2 + 1 denominators keep the estimate finite when there are no doubletons (f2 = 0), which
 * is why the bias-corrected form is used rather than Colwell & Coddington's (1994, Phil. Trans.
 * R. Soc. B 345, 101–118) S_obs + f1² / (2 f2). With f1 = 0 the estimate is S_obs and the
 * variance formula gives 0. NaN for an empty sample (N = 0).
 */
export function chao1(observed: number, singletons: number, doubletons: number, occurrences: number): Chao1 {
  if (occurrences <= 0) return { estimate: Number.NaN, sd: Number.NaN };
  const k = (occurrences - 1) / occurrences;
  const f1 = singletons;
  const f2p = doubletons + 1;
  const unseen = (k * f1 * (f1 - 1)) / (2 * f2p);
  const variance = unseen
    + (k * k * f1 * (2 * f1 - 1) ** 2) / (4 * f2p * f2p)
    + (k * k * f1 * f1 * doubletons * (f1 - 1) ** 2) / (4 * f2p ** 4);
  return { estimate: observed + unseen, sd: Math.sqrt(variance) };
}
