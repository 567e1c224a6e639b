package tetrapod.analysis;

/**
 * The governing reactions of one leg base over every case: the largest compression (support
 * pushing up), the largest uplift (support pulling down; null when the leg never lifts) and the
 * largest horizontal shear, all as positive magnitudes in N.
 */
public record LegBaseExtremes(int node, Extreme compression, Extreme uplift, Extreme shear) { }
