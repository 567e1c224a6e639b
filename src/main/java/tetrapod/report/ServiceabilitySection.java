package tetrapod.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import tetrapod.analysis.Movement;
import tetrapod.analysis.ServiceabilityVerdict;
import tetrapod.report.Rows.MovementRow;
import tetrapod.report.Rows.ServiceRow;
import tetrapod.report.Table.Cell;

/**
 * How far the tower moves under the serviceability wind: the combination and its wind, the method,
 * the verdict, sway, tilt and twist against height with the limits, and a table of the ancillaries,
 * the top level and every level with a limit (every level in the appendix and serviceability.csv).
 */
final class ServiceabilitySection implements Section {

    private static final List<String> MOVEMENTS = List.of("sway", "tilt", "twist");

    @Override
    public String id() {
        return "serviceability";
    }

    @Override
    public String title() {
        return "Serviceability: sway, tilt and twist";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        List<ServiceRow> rows = r.serviceability();
        if (rows.isEmpty()) {
            out.p("Not computed: an explicit frame has no panel levels to measure.");
            return;
        }
        Rows.ServiceCase c = r.serviceCase().orElseThrow();
        out.p("Combination " + c.combination() + " (the dead load"
                + (c.combination().contains("Q") ? ", the nodal loads" : "")
                + (c.windRule().isEmpty() ? "; the model has no wind" : " and the service wind Ws")
                + ", factor 1.0, no ice) from every azimuth. "
                + (c.windRule().isEmpty() ? "" : "Ws: " + c.windRule() + "; velocity pressure "
                + Format.fixed(c.pressureRatio(), 3) + " times the strength wind's. ")
                + "Each panel level moves as the rigid body that best fits (least squares) the displacements of its "
                + "four leg nodes: sway is the horizontal displacement of their centre, tilt the rotation about a "
                + "horizontal axis, twist the rotation about the vertical. An ancillary takes the straight-line "
                + "interpolation of the levels below and above it at its attachment point (the middle of its face, or "
                + "the axis), an item running up the tower the largest value along its run. Each value is the largest "
                + "over every azimuth (by superposition), given with that azimuth.");
        out.element("p", "class=\"verdict\"", "Verdict: " + verdict(rows));
        Charts.serviceability(r).ifPresent(f -> ReportHtml.figure(out, f));
        Table t = new Table("serviceability-table", "", List.of("level or ancillary", "height, m", "sway, mm",
                "tilt, °", "twist, °", "limits: sway mm, tilt °, twist °", "verdict"));
        ServiceRow top = null;
        for (ServiceRow row : rows) {
            if (row.isLevel()) {
                top = row;
            }
        }
        for (ServiceRow row : rows) {
            if (!row.isLevel() || row == top || row.hasLimits()) {
                t.row(row(row));
            }
        }
        t.writeTo(out);
        out.p("Every panel level is listed in the appendix (E) and in serviceability.csv.");
    }

    /** One row of the table: the movements with their azimuths, the limits and the verdict. */
    static List<Cell> row(ServiceRow row) {
        List<Cell> cells = new ArrayList<>();
        cells.add(Cell.of(row.name()));
        cells.add(Cell.num(row.zFrom() == row.zTo() ? Format.metres(row.zFrom())
                : Format.metres(row.zFrom()) + "–" + Format.metres(row.zTo())));
        List<String> limits = new ArrayList<>();
        boolean anyLimit = false;
        boolean allMet = true;
        for (String q : MOVEMENTS) {
            MovementRow m = row.movement(q);
            String value = amount(q, m.value()) + (m.azimuthDeg() == null ? "" : " at " + Format.azimuth(m.azimuthDeg()));
            cells.add(Boolean.FALSE.equals(m.met()) ? new Cell(value, "num over", "") : Cell.num(value));
            limits.add(m.hasLimit() ? amount(q, m.limit()) : "–");
            anyLimit |= m.hasLimit();
            allMet &= !Boolean.FALSE.equals(m.met());
        }
        cells.add(Cell.num(anyLimit ? String.join(", ", limits) : "none"));
        cells.add(!anyLimit ? Cell.of("no limit") : allMet ? Cell.of("met") : new Cell("NOT MET", "over", ""));
        return cells;
    }

    /** Sway in mm to 0.1 mm, rotations in degrees to 0.001°. */
    private static String amount(String q, double value) {
        return q.equals("sway") ? Format.fixed(value * 1e3, 1) : Format.fixed(Math.toDegrees(value), 3);
    }

    /** The verdict line, as the analyze summary prints it. */
    static String verdict(List<ServiceRow> rows) {
        List<ServiceabilityVerdict.Exceedance> exceedances = new ArrayList<>();
        int levels = 0;
        int items = 0;
        for (ServiceRow row : rows) {
            if (row.hasLimits()) {
                if (row.isLevel()) {
                    levels++;
                } else {
                    items++;
                }
            }
        }
        for (boolean level : new boolean[] {true, false}) {
            for (ServiceRow row : rows) {
                if (row.isLevel() != level) {
                    continue;
                }
                for (String q : MOVEMENTS) {
                    MovementRow m = row.movement(q);
                    if (Boolean.FALSE.equals(m.met())) {
                        exceedances.add(new ServiceabilityVerdict.Exceedance(row.name(), !row.isLevel(),
                                Movement.valueOf(q.toUpperCase(Locale.ROOT)), m.value(), m.limit(), m.azimuthDeg()));
                    }
                }
            }
        }
        return ServiceabilityVerdict.line(exceedances, levels, items);
    }
}
