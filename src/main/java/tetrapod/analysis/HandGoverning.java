package tetrapod.analysis;

import java.util.List;
import java.util.Optional;

/**
 * Where the hand method is set beside the analysis: compression in the case with the analysis'
 * largest leg compression, uplift in the case with its largest uplift. Each case's combination is
 * the one that governs that quantity (a heavier dead load governs compression, a lighter one
 * uplift), and the comparison is shown over every azimuth of that combination.
 *
 * @param compression the case of the largest analysed leg compression
 * @param uplift      the case of the largest analysed uplift (the least compression when no leg lifts)
 */
public record HandGoverning(HandComparison compression, HandComparison uplift) {

    /** The governing cases of {@code rows}, the first of equals in their order; empty when there are none. */
    public static Optional<HandGoverning> of(List<HandComparison> rows) {
        HandComparison compression = null;
        HandComparison uplift = null;
        for (HandComparison h : rows) {
            if (compression == null || h.feMaxCompression() > compression.feMaxCompression()) {
                compression = h;
            }
            if (uplift == null || h.feMaxTension() > uplift.feMaxTension()) {
                uplift = h;
            }
        }
        return compression == null ? Optional.empty() : Optional.of(new HandGoverning(compression, uplift));
    }
}
