package tetrapod.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SaveMode;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataType;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;
import tetrapod.batch.SummaryColumn;
import tetrapod.batch.SummaryRow;
import tetrapod.io.ParquetFile;

/**
 * summary.parquet written by Spark: one row per tower × scenario in manifest order, the columns of
 * summary.csv at full precision (forces in kN), null where the analysis has no such figure. The
 * schema is that of the plain batch's summary.parquet.
 */
final class SummaryFrame {

    /** The plain batch's schema ({@link SummaryColumn}) as Spark's. */
    static final StructType SCHEMA = new StructType(Arrays.stream(SummaryColumn.values())
            .map(c -> DataTypes.createStructField(c.header(), sparkType(c.type()), !c.required()))
            .toArray(StructField[]::new));

    private SummaryFrame() { }

    private static DataType sparkType(ParquetFile.Type type) {
        return switch (type) {
            case STRING -> DataTypes.StringType;
            case INT32 -> DataTypes.IntegerType;
            case DOUBLE -> DataTypes.DoubleType;
        };
    }

    /** A summary row as a Spark row of {@link #SCHEMA}. */
    static Row row(SummaryRow r) {
        return RowFactory.create(SummaryColumn.valuesOf(r).toArray());
    }

    /**
     * Writes {@code rows} to the Parquet file {@code file} with Spark: as one partition into a
     * folder beside it, whose one data file is then moved into place, so that {@code file} is one
     * Parquet file (as the plain batch writes it) and never half written.
     */
    static void write(SparkSession spark, List<SummaryRow> rows, Path file) throws IOException {
        // the folder's path as a file: URI, the same on every machine that shares the file system
        Path staging = file.resolveSibling(file.getFileName() + ".spark");
        deleteTree(staging);
        spark.createDataFrame(rows.stream().map(SummaryFrame::row).toList(), SCHEMA)
                .coalesce(1).write().mode(SaveMode.ErrorIfExists).parquet(staging.toUri().toString());
        List<Path> parts;
        try (Stream<Path> files = Files.list(staging)) {
            parts = files.filter(p -> p.getFileName().toString().startsWith("part-")
                    && p.getFileName().toString().endsWith(".parquet")).toList();
        }
        if (parts.size() != 1) {
            throw new IOException("Spark wrote " + parts.size() + " Parquet files into " + staging + ", expected one"
                    + " (is the output folder on a file system that the driver and the executors share?)");
        }
        Files.move(parts.get(0), file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        deleteTree(staging);
    }

    private static void deleteTree(Path folder) throws IOException {
        if (!Files.exists(folder)) {
            return;
        }
        try (Stream<Path> all = Files.walk(folder)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
