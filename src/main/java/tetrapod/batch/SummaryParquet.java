package tetrapod.batch;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import tetrapod.io.AtomicFiles;
import tetrapod.io.ParquetFile;

/** summary.parquet: the rows of summary.csv, in the same order, with full-precision values ({@link SummaryColumn}). */
public final class SummaryParquet {

    public static final String FILE = "summary.parquet";

    private SummaryParquet() { }

    public static void write(Path file, List<SummaryRow> rows, String createdBy) throws IOException {
        List<ParquetFile.Column> columns = Arrays.stream(SummaryColumn.values()).map(SummaryColumn::parquet).toList();
        List<List<Object>> values = rows.stream().map(SummaryColumn::valuesOf).toList();
        AtomicFiles.writeStream(file, out -> ParquetFile.write(out, columns, values, createdBy));
    }
}
