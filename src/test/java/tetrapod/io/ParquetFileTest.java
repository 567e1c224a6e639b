package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.parquet.column.Encoding;
import org.apache.parquet.hadoop.metadata.BlockMetaData;
import org.apache.parquet.hadoop.metadata.ColumnChunkMetaData;
import org.apache.parquet.hadoop.metadata.CompressionCodecName;
import org.apache.parquet.hadoop.metadata.ParquetMetadata;
import org.apache.parquet.schema.MessageTypeParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.io.ParquetFile.Column;
import tetrapod.io.ParquetFile.Type;

/** Our Parquet files, read back by Apache parquet-java: the reference for the format here. */
class ParquetFileTest {

    private static final List<Column> COLUMNS = List.of(new Column("name", Type.STRING, true),
            new Column("count", Type.INT32, true), new Column("size", Type.DOUBLE, false),
            new Column("rank", Type.INT32, false), new Column("note", Type.STRING, false));

    private static Path write(Path dir, List<Column> columns, List<List<Object>> rows) throws IOException {
        Path file = dir.resolve("t.parquet");
        AtomicFiles.writeStream(file, out -> ParquetFile.write(out, columns, rows, "tetrapod test"));
        return file;
    }

    /** Rows with nulls in runs of 1 to 200 (RLE run lengths past one varint byte), negative and large values, UTF-8. */
    private static List<List<Object>> rows() {
        List<List<Object>> rows = new ArrayList<>();
        for (int k = 0; k < 400; k++) {
            boolean gap = (k >= 100 && k < 300) || k % 7 == 3;
            rows.add(Arrays.asList("tower " + k + (k % 5 == 0 ? " Øresund ≥ 30 m, \"quoted\"" : ""),
                    k == 1 ? Integer.MIN_VALUE : k == 2 ? Integer.MAX_VALUE : k - 200,
                    gap ? null : k == 4 ? -0.0 : k * 1.0e-3 + Math.PI * 1e6,
                    gap || k % 2 == 0 ? null : k,
                    k % 3 == 0 ? "" : gap ? null : "n" + k));
        }
        return rows;
    }

    @Test
    void parquetJavaReadsEveryValueAndEveryNullBack(@TempDir Path dir) throws IOException {
        List<List<Object>> rows = rows();
        List<List<Object>> back = ParquetRows.read(write(dir, COLUMNS, rows));
        assertEquals(rows, back);
        assertEquals(Double.doubleToRawLongBits(-0.0), Double.doubleToRawLongBits((Double) back.get(4).get(2)),
                "full doubles, bit for bit");
    }

    @Test
    void theSchemaAndLayoutAreAsWritten(@TempDir Path dir) throws IOException {
        ParquetMetadata footer = ParquetRows.footer(write(dir, COLUMNS, rows()));
        // the expected schema in parquet-java's own schema language
        ParquetRows.assertSameFields(MessageTypeParser.parseMessageType("""
                message schema {
                  required binary name (STRING);
                  required int32 count;
                  optional double size;
                  optional int32 rank;
                  optional binary note (STRING);
                }"""), footer.getFileMetaData().getSchema());
        assertEquals("tetrapod test", footer.getFileMetaData().getCreatedBy());
        assertEquals(1, footer.getBlocks().size(), "one row group");
        BlockMetaData group = footer.getBlocks().get(0);
        assertEquals(400, group.getRowCount());
        for (ColumnChunkMetaData chunk : group.getColumns()) {
            assertEquals(CompressionCodecName.UNCOMPRESSED, chunk.getCodec());
            assertEquals(400, chunk.getValueCount());
            assertEquals(true, chunk.getEncodings().contains(Encoding.PLAIN), chunk.getEncodings().toString());
        }
    }

    @Test
    void aTableWithoutRowsHasTheSchemaAndNoRowGroup(@TempDir Path dir) throws IOException {
        Path file = write(dir, COLUMNS, List.of());
        assertEquals(List.of(), ParquetRows.read(file));
        assertEquals(5, ParquetRows.footer(file).getFileMetaData().getSchema().getFieldCount());
        assertEquals(0, ParquetRows.footer(file).getBlocks().size());
    }

    @Test
    void theFileStartsAndEndsWithTheMagicAndItsFooterLength(@TempDir Path dir) throws IOException {
        byte[] bytes = Files.readAllBytes(write(dir, COLUMNS, rows()));
        byte[] magic = "PAR1".getBytes(StandardCharsets.US_ASCII);
        assertArrayEquals(magic, Arrays.copyOfRange(bytes, 0, 4));
        assertArrayEquals(magic, Arrays.copyOfRange(bytes, bytes.length - 4, bytes.length));
    }

    @Test
    void aMissingRequiredValueIsAnErrorNotAFile() {
        OutputStream sink = new ByteArrayOutputStream();
        List<List<Object>> rows = List.of(Arrays.asList(null, 1, null, null, null));
        assertThrows(IllegalArgumentException.class, () -> ParquetFile.write(sink, COLUMNS, rows, "t"));
    }
}
