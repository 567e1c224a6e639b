package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.parquet.example.data.Group;
import org.apache.parquet.hadoop.ParquetFileReader;
import org.apache.parquet.hadoop.ParquetReader;
import org.apache.parquet.hadoop.example.GroupReadSupport;
import org.apache.parquet.hadoop.metadata.ParquetMetadata;
import org.apache.parquet.io.LocalInputFile;
import org.apache.parquet.schema.MessageType;
import org.apache.parquet.schema.PrimitiveType;
import org.apache.parquet.schema.Type;

/**
 * A Parquet file read back with Apache parquet-java (an independent implementation of the format),
 * each row as a list of plain values in column order: String, Integer or Double, null where the
 * column has no value.
 */
public final class ParquetRows {

    private ParquetRows() { }

    public static ParquetMetadata footer(Path file) throws IOException {
        try (ParquetFileReader reader = ParquetFileReader.open(new LocalInputFile(file))) {
            return reader.getFooter();
        }
    }

    /**
     * Fails unless {@code actual} has the fields of {@code expected}: names, order, repetition,
     * physical and logical types (column sort orders, which the reader fills in itself, aside).
     */
    public static void assertSameFields(MessageType expected, MessageType actual) {
        assertEquals(expected.getFieldCount(), actual.getFieldCount(), actual.toString());
        for (int c = 0; c < expected.getFieldCount(); c++) {
            PrimitiveType e = expected.getType(c).asPrimitiveType();
            PrimitiveType a = actual.getType(c).asPrimitiveType();
            assertEquals(e.getName(), a.getName());
            assertEquals(e.getRepetition(), a.getRepetition(), e.getName());
            assertEquals(e.getPrimitiveTypeName(), a.getPrimitiveTypeName(), e.getName());
            assertEquals(e.getLogicalTypeAnnotation(), a.getLogicalTypeAnnotation(), e.getName());
        }
    }

    public static List<List<Object>> read(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        try (ParquetReader<Group> reader = ParquetReader.builder(new GroupReadSupport(),
                new org.apache.hadoop.fs.Path(file.toUri())).build()) {
            for (Group g = reader.read(); g != null; g = reader.read()) {
                List<Object> row = new ArrayList<>();
                for (int c = 0; c < g.getType().getFieldCount(); c++) {
                    row.add(value(g, c));
                }
                rows.add(row);
            }
        }
        return rows;
    }

    private static Object value(Group g, int column) {
        if (g.getFieldRepetitionCount(column) == 0) {
            return null;
        }
        Type type = g.getType().getType(column);
        PrimitiveType.PrimitiveTypeName physical = type.asPrimitiveType().getPrimitiveTypeName();
        return switch (physical) {
            case INT32 -> g.getInteger(column, 0);
            case DOUBLE -> g.getDouble(column, 0);
            case BINARY -> g.getString(column, 0);
            default -> throw new AssertionError("unexpected type " + type);
        };
    }
}
