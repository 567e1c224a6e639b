package tetrapod.batch;

import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import tetrapod.io.ParquetFile;
import tetrapod.io.ParquetFile.Type;

/**
 * The columns of the fleet summary, in order: their names (summary.csv's header), their Parquet
 * types and whether every row has a value, and each row's value at full precision (forces in kN,
 * null where the analysis has no such figure). The one definition of the summary's schema, for
 * summary.csv, summary.parquet and any other writer of the same table.
 */
public enum SummaryColumn {
    MODEL("model", Type.STRING, true, SummaryRow::model),
    SCENARIO("scenario", Type.STRING, true, SummaryRow::scenario),
    STATUS("status", Type.STRING, true, r -> r.outcome().status()),
    EXIT_CODE("exit_code", Type.INT32, true, r -> r.outcome().exitCode()),
    MESSAGE("message", Type.STRING, true, r -> r.outcome().message()),
    MAX_UTILISATION("max_utilisation", Type.DOUBLE, false, figure(Figures::maxUtilisation)),
    MEMBER("member", Type.INT32, false, figure(Figures::member)),
    ROLE("role", Type.STRING, false, figure(Figures::role)),
    GOVERNING_AZIMUTH_DEG("governing_azimuth_deg", Type.DOUBLE, false, figure(Figures::azimuthDeg)),
    REQUIREMENT_BREACHES("requirement_breaches", Type.INT32, false, figure(Figures::requirementBreaches)),
    MAX_FOOTING_UTILISATION("max_footing_utilisation", Type.DOUBLE, false, figure(Figures::footingUtilisation)),
    LEG_COMPRESSION_KN("leg_compression_kN", Type.DOUBLE, false, figure(f -> f.legCompression() / 1000)),
    LEG_UPLIFT_KN("leg_uplift_kN", Type.DOUBLE, false, figure(f -> f.legUplift() / 1000)),
    STEEL_MASS_KG("steel_mass_kg", Type.DOUBLE, false, figure(Figures::steelMass)),
    SERVICEABILITY("serviceability", Type.STRING, false, figure(Figures::serviceability)),
    MAX_UTILISATION_CHANGE_FROM_BASE("max_utilisation_change_from_base", Type.DOUBLE, false, SummaryRow::changeFromBase),
    REPORT("report", Type.STRING, false, r -> r.outcome().report() == null ? null : r.outcome().report() + "/report.html");

    private final String header;
    private final Type type;
    private final boolean required;
    private final Function<SummaryRow, Object> value;

    SummaryColumn(String header, Type type, boolean required, Function<SummaryRow, Object> value) {
        this.header = header;
        this.type = type;
        this.required = required;
        this.value = value;
    }

    /** The column's name in summary.csv and summary.parquet. */
    public String header() {
        return header;
    }

    public Type type() {
        return type;
    }

    /** Whether every row has a value (Parquet REQUIRED) rather than perhaps null (OPTIONAL). */
    public boolean required() {
        return required;
    }

    /** The row's value: a String, Integer or Double as {@link #type()} says, or null. */
    public Object valueOf(SummaryRow row) {
        return value.apply(row);
    }

    public ParquetFile.Column parquet() {
        return new ParquetFile.Column(header, type, required);
    }

    /** The row's values in column order. */
    public static List<Object> valuesOf(SummaryRow row) {
        return Arrays.stream(values()).map(c -> c.valueOf(row)).toList();
    }

    public static List<String> headers() {
        return Arrays.stream(values()).map(SummaryColumn::header).toList();
    }

    /** A figure of the analysis, null when it has none (it did not finish). */
    private static Function<SummaryRow, Object> figure(Function<Figures, Object> of) {
        return r -> r.outcome().figures() == null ? null : of.apply(r.outcome().figures());
    }
}
