package tetrapod.batch;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import tetrapod.io.AtomicFiles;

/** summary.csv: one row per tower × scenario, in manifest order; units in the headers. */
public final class SummaryTable {

    public static final String FILE = "summary.csv";

    static final List<String> HEADER = SummaryColumn.headers();

    private SummaryTable() { }

    public static void write(Path file, List<SummaryRow> rows) throws IOException {
        AtomicFiles.writeText(file, out -> {
            CSVPrinter csv = new CSVPrinter(out, CSVFormat.RFC4180);
            csv.printRecord(HEADER);
            for (SummaryRow r : rows) {
                csv.printRecord(cells(r));
            }
            csv.flush();
        });
    }

    /** The row's cells as text; a figure the analysis does not have is an empty cell. */
    static List<String> cells(SummaryRow r) {
        Outcome o = r.outcome();
        Figures f = o.figures();
        List<String> c = new ArrayList<>(List.of(r.model(), r.scenario(), o.status(), String.valueOf(o.exitCode()),
                o.message()));
        if (f == null) {
            c.addAll(List.of("", "", "", "", "", "", "", "", "", ""));
        } else {
            c.add(fixed(f.maxUtilisation(), 3));
            c.add(f.member() == null ? "" : f.member().toString());
            c.add(f.role() == null ? "" : f.role());
            c.add(fixed(f.azimuthDeg(), 1));
            c.add(String.valueOf(f.requirementBreaches()));
            c.add(fixed(f.footingUtilisation(), 3));
            c.add(fixed(f.legCompression() / 1000, 1));
            c.add(fixed(f.legUplift() / 1000, 1));
            c.add(fixed(f.steelMass(), 1));
            c.add(f.serviceability() == null ? "" : f.serviceability());
        }
        c.add(fixed(r.changeFromBase(), 3));
        c.add(o.report() == null ? "" : o.report() + "/report.html");
        return c;
    }

    static String fixed(Double v, int decimals) {
        return v == null ? "" : String.format(Locale.ROOT, "%." + decimals + "f", v + 0.0);
    }
}
