package tetrapod.batch;

import java.util.Map;
import tetrapod.report.Results;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.FootingCheck;
import tetrapod.report.Rows.FootingRow;
import tetrapod.report.Rows.LegBaseRow;
import tetrapod.report.Rows.MovementRow;
import tetrapod.report.Rows.ServiceRow;

/** The summary's figures of one analysis, read from its results document as the report reads it. */
public final class ResultFigures {

    private ResultFigures() { }

    public static Figures of(Results results) {
        CheckRow worst = results.checksByUtilisation().stream().findFirst().orElse(null);
        Double footing = null;
        for (FootingRow f : results.foundations()) {
            for (FootingCheck c : f.checks()) {
                footing = footing == null ? c.utilisation() : Math.max(footing, c.utilisation());
            }
        }
        double compression = 0;
        double uplift = 0;
        for (LegBaseRow leg : results.legBases()) {
            if (leg.compression().occurs()) {
                compression = Math.max(compression, leg.compression().value());
            }
            if (leg.uplift().occurs()) {
                uplift = Math.max(uplift, leg.uplift().value());
            }
        }
        Map<String, Object> steel = results.steel();
        double mass = steel.get("massWithAllowance") instanceof Number n ? n.doubleValue() : 0;
        return new Figures(worst == null ? null : worst.utilisation(), worst == null ? null : worst.member(),
                worst == null ? null : results.member(worst.member()).role(), worst == null ? null : worst.azimuthDeg(),
                results.requirementsNotMet().size(), footing, compression, uplift, mass, serviceability(results));
    }

    /** "not met" when any movement with a limit exceeds it, "met" when all are within, null without limits. */
    private static String serviceability(Results results) {
        boolean limited = false;
        for (ServiceRow row : results.serviceability()) {
            for (MovementRow m : new MovementRow[] {row.sway(), row.tilt(), row.twist()}) {
                if (m.met() != null) {
                    limited = true;
                    if (!m.met()) {
                        return "not met";
                    }
                }
            }
        }
        return limited ? "met" : null;
    }
}
