package tetrapod.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import tetrapod.io.AtomicFiles;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.LegBaseRow;
import tetrapod.report.Rows.MemberRow;
import tetrapod.report.Rows.PanelRow;
import tetrapod.report.Rows.RequirementRow;
import tetrapod.report.Rows.Peak;
import tetrapod.report.Rows.WindRow;

/**
 * The tables for spreadsheets: members.csv, reactions.csv, wind.csv, requirements.csv and serviceability.csv. One header row whose
 * names carry the unit ({@code N_max_kN}), RFC 4180 quoting and CRLF line ends, numbers with a
 * point and no thousands separator, empty cells where a value does not apply; a text cell that a
 * spreadsheet would take for a formula starts with an apostrophe ({@link CsvText}).
 */
public final class CsvTables {

    public static final String MEMBERS = "members.csv";
    public static final String REACTIONS = "reactions.csv";
    public static final String WIND = "wind.csv";
    public static final String REQUIREMENTS = "requirements.csv";
    public static final String SERVICEABILITY = "serviceability.csv";

    static final List<String> MEMBER_HEADER = List.of("member", "role", "segment", "panel", "face", "section",
            "length_m", "N_max_kN", "N_max_case", "N_min_kN", "N_min_case", "utilisation", "mode", "clause",
            "governing_combination", "governing_azimuth_deg", "governing_case", "note");
    static final List<String> REACTION_HEADER = List.of("node", "x_m", "y_m",
            "compression_max_kN", "compression_combination", "compression_azimuth_deg",
            "uplift_max_kN", "uplift_combination", "uplift_azimuth_deg",
            "shear_max_kN", "shear_combination", "shear_azimuth_deg");
    static final List<String> REQUIREMENT_HEADER = List.of("member", "role", "segment", "section", "rule", "ratio",
            "met", "clause", "note");
    static final List<String> WIND_HEADER = List.of("azimuth_deg", "panel", "z_bottom_m", "z_top_m", "z_ref_m",
            "q_kPa", "solidity", "cf", "area_m2", "Fx_kN", "Fy_kN", "F_kN");

    static final List<String> SERVICEABILITY_HEADER = List.of("kind", "name", "level", "face", "z_from_m", "z_to_m",
            "sway_mm", "sway_azimuth_deg", "sway_at_m", "sway_limit_mm", "sway_met",
            "tilt_deg", "tilt_azimuth_deg", "tilt_at_m", "tilt_limit_deg", "tilt_met",
            "twist_deg", "twist_azimuth_deg", "twist_at_m", "twist_limit_deg", "twist_met");

    private static final CSVFormat FORMAT = CSVFormat.RFC4180;

    private CsvTables() { }

    /** Writes the tables into {@code folder}, each atomically. */
    public static void writeAll(Results results, Path folder) throws IOException {
        AtomicFiles.writeText(folder.resolve(MEMBERS), out -> members(results, out));
        AtomicFiles.writeText(folder.resolve(REACTIONS), out -> reactions(results, out));
        AtomicFiles.writeText(folder.resolve(WIND), out -> wind(results, out));
        AtomicFiles.writeText(folder.resolve(REQUIREMENTS), out -> requirements(results, out));
        AtomicFiles.writeText(folder.resolve(SERVICEABILITY), out -> serviceability(results, out));
    }

    /**
     * One row per panel level (bottom to top), then per ancillary: the largest sway (mm), tilt and
     * twist (degrees) under the serviceability combination, each with the wind azimuth and the height
     * where it occurs, its limit and whether it is met (empty cells where no limit is given). Only the
     * header for an explicit frame.
     */
    public static void serviceability(Results results, Appendable out) throws IOException {
        CSVPrinter csv = new CSVPrinter(out, FORMAT);
        csv.printRecord(SERVICEABILITY_HEADER);
        for (Rows.ServiceRow r : results.serviceability()) {
            List<Object> row = new ArrayList<>(List.of(text(r.kind()), text(r.name()), r.isLevel() ? r.level() : "",
                    text(r.face()), fixed(r.zFrom(), 4), fixed(r.zTo(), 4)));
            for (String q : List.of("sway", "tilt", "twist")) {
                Rows.MovementRow m = r.movement(q);
                double scale = q.equals("sway") ? 1e3 : 180 / Math.PI;
                row.add(fixed(m.value() * scale, q.equals("sway") ? 3 : 5));
                row.add(deg(m.azimuthDeg()));
                row.add(fixed(m.z(), 4));
                row.add(m.hasLimit() ? fixed(m.limit() * scale, q.equals("sway") ? 3 : 5) : "");
                row.add(m.met() == null ? "" : m.met() ? "yes" : "no");
            }
            csv.printRecord(row);
        }
        csv.flush(); // not closed: the caller owns the stream
    }

    /**
     * One row per member and requirement (a rule that does not depend on the load): the ratio of
     * the member's value to the rule's limit and whether it is met.
     */
    public static void requirements(Results results, Appendable out) throws IOException {
        CSVPrinter csv = new CSVPrinter(out, FORMAT);
        csv.printRecord(REQUIREMENT_HEADER);
        for (RequirementRow q : results.requirements()) {
            MemberRow m = results.member(q.member());
            csv.printRecord(m.id(), text(m.role()), m.segment(), text(m.section()), text(q.ruleLabel()),
                    fixed(q.ratio(), 4), q.met() ? "yes" : "no", text(q.clause()), text(q.note()));
        }
        csv.flush(); // not closed: the caller owns the stream
    }

    /**
     * One row per member: its place and section, its largest tension (N_max, ≥ 0) and compression
     * (N_min, ≤ 0, tension positive) with the cases, and its governing check.
     */
    public static void members(Results results, Appendable out) throws IOException {
        CSVPrinter csv = new CSVPrinter(out, FORMAT);
        csv.printRecord(MEMBER_HEADER);
        for (CheckRow c : results.checks()) {
            MemberRow m = results.member(c.member());
            csv.printRecord(m.id(), text(m.role()), m.segment(), m.panel(), text(m.face()), text(m.section()),
                    fixed(m.length(), 4), kN(c.maxTension().value()), text(c.maxTension().caseId()),
                    kN(-c.maxCompression().value()), text(c.maxCompression().caseId()),
                    fixed(c.utilisation(), 4), text(c.mode()), text(c.clause()), text(results.combinationOf(c.caseId())),
                    deg(c.azimuthDeg()), text(c.caseId()), text(c.note()));
        }
        csv.flush(); // not closed: the caller owns the stream
    }

    /** One row per leg base: the largest compression, uplift and horizontal shear, each with its case. */
    public static void reactions(Results results, Appendable out) throws IOException {
        CSVPrinter csv = new CSVPrinter(out, FORMAT);
        csv.printRecord(REACTION_HEADER);
        for (LegBaseRow l : results.legBases()) {
            List<Object> row = new ArrayList<>(List.of(l.node(), fixed(l.x(), 4), fixed(l.y(), 4)));
            for (Peak p : List.of(l.compression(), l.uplift(), l.shear())) {
                row.add(p.occurs() ? kN(p.value()) : "");
                row.add(text(results.combinationOf(p.caseId())));
                row.add(p.occurs() ? deg(p.azimuthDeg()) : "");
            }
            csv.printRecord(row);
        }
        csv.flush(); // not closed: the caller owns the stream
    }

    /** One row per panel at each azimuth reported in full. */
    public static void wind(Results results, Appendable out) throws IOException {
        CSVPrinter csv = new CSVPrinter(out, FORMAT);
        csv.printRecord(WIND_HEADER);
        for (WindRow w : results.wind()) {
            for (PanelRow p : w.panels()) {
                csv.printRecord(deg(w.azimuthDeg()), p.panel(), fixed(p.zBottom(), 4), fixed(p.zTop(), 4),
                        fixed(p.zRef(), 4), fixed(p.q() / 1e3, 5), fixed(p.solidity(), 5), fixed(p.cf(), 5),
                        fixed(p.area(), 5), kN(p.fx()), kN(p.fy()), kN(p.force()));
            }
        }
        csv.flush(); // not closed: the caller owns the stream
    }

    /** N as kN to 1 N. */
    private static String kN(double newtons) {
        return fixed(newtons / 1e3, 3);
    }

    private static String deg(Double azimuthDeg) {
        return azimuthDeg == null ? "" : Format.degrees(azimuthDeg);
    }

    private static String fixed(double v, int decimals) {
        return Format.fixed(v, decimals);
    }

    /** A text cell: empty for null, formula characters at its start neutralised ({@link CsvText}). */
    private static String text(String s) {
        return CsvText.cell(s);
    }
}
