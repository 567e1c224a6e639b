package tetrapod.analysis;

import tetrapod.check.Extreme;

/**
 * The governing reactions of one leg base over every case, as positive magnitudes in N: the
 * largest compression (support pushing up on the leg), the largest uplift (support pulling down;
 * {@link Extreme#NONE} when the leg never lifts) and the largest horizontal shear.
 */
public record LegBaseExtremes(int node, Extreme compression, Extreme uplift, Extreme shear) { }
