package tetrapod.analysis;

import tetrapod.check.HandMethod;

/**
 * The hand method beside the analysis for one case: the hand leg forces from the case's total
 * loads and the analysis' most compressed and most lifted leg base (N, positive magnitudes;
 * tension negative when every leg stays in compression).
 */
public record HandComparison(String combination, HandMethod.Result hand, double feMaxCompression,
                             double feMaxTension) {

    public double compressionDifferencePct() {
        return HandMethod.Result.differencePct(hand.legs().compression(), feMaxCompression);
    }

    public double tensionDifferencePct() {
        return HandMethod.Result.differencePct(hand.legs().tension(), feMaxTension);
    }
}
