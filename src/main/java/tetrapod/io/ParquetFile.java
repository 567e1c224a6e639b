package tetrapod.io;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * A flat table as one Apache Parquet file, following the Apache Parquet format specification
 * (parquet-format: README "File Format", "Metadata", "Data Pages"; Encodings.md; LogicalTypes.md;
 * the Thrift definitions in parquet.thrift): one row group, one column chunk per column, each a
 * single DATA_PAGE (v1) in PLAIN encoding, UNCOMPRESSED, no statistics, no dictionary. Columns are
 * INT32, DOUBLE or UTF-8 strings; an OPTIONAL column's nulls are its definition levels (0 null, 1
 * present). Written whole in memory: meant for summaries of a few hundred thousand rows at most.
 */
public final class ParquetFile {

    /** "PAR1", at both ends of the file (README "File Format"). */
    private static final byte[] MAGIC = "PAR1".getBytes(StandardCharsets.US_ASCII);

    // parquet.thrift enum values
    private static final int DATA_PAGE = 0;          // PageType
    private static final int PLAIN = 0;              // Encoding
    private static final int RLE = 3;                // Encoding
    private static final int UNCOMPRESSED = 0;       // CompressionCodec
    private static final int REQUIRED = 0;           // FieldRepetitionType
    private static final int OPTIONAL = 1;
    private static final int CONVERTED_UTF8 = 0;     // ConvertedType, written beside the STRING logical type

    /** A column's type: the physical type of parquet.thrift's {@code Type} enum, strings with the STRING logical type. */
    public enum Type {
        INT32(1), DOUBLE(5), STRING(6);

        final int physical;

        Type(int physical) {
            this.physical = physical;
        }
    }

    /** One column: its name, its type, and whether every row has a value (REQUIRED) or may be null (OPTIONAL). */
    public record Column(String name, Type type, boolean required) { }

    private ParquetFile() { }

    /**
     * Writes {@code rows} (each a list of values in column order: Integer, Double or String, null
     * only in an optional column) as a Parquet file to {@code out}.
     */
    public static void write(OutputStream out, List<Column> columns, List<? extends List<?>> rows, String createdBy)
            throws IOException {
        for (int r = 0; r < rows.size(); r++) {
            if (rows.get(r).size() != columns.size()) {
                throw new IllegalArgumentException("row " + r + " has " + rows.get(r).size() + " values for "
                        + columns.size() + " columns");
            }
        }
        long offset = MAGIC.length;
        out.write(MAGIC);
        List<long[]> chunks = new ArrayList<>(); // per column: data page offset, chunk size
        for (int c = 0; c < columns.size() && !rows.isEmpty(); c++) { // no rows: no row group
            byte[] chunk = columnChunk(columns.get(c), c, rows);
            out.write(chunk);
            chunks.add(new long[] {offset, chunk.length});
            offset += chunk.length;
        }
        byte[] footer = fileMetaData(columns, rows.size(), chunks, createdBy);
        out.write(footer);
        out.write(littleEndian(footer.length));
        out.write(MAGIC);
        out.flush();
    }

    /** A column chunk of one page: PageHeader then the page (README "Data Pages"). */
    private static byte[] columnChunk(Column column, int index, List<? extends List<?>> rows) throws IOException {
        ByteArrayOutputStream page = new ByteArrayOutputStream();
        if (!column.required()) {
            // max definition level 1: levels precede the values, prefixed by their length in 4 bytes little endian
            // (Encodings.md "Run Length Encoding / Bit-Packing Hybrid", for data page v1)
            byte[] levels = definitionLevels(rows, index);
            page.write(littleEndian(levels.length));
            page.write(levels);
        }
        for (List<?> row : rows) {
            Object value = row.get(index);
            if (value == null) {
                if (column.required()) {
                    throw new IllegalArgumentException("column " + column.name() + " is required but a row has no value");
                }
                continue;
            }
            page.write(plain(column.type(), value));
        }
        byte[] data = page.toByteArray();
        byte[] header = new ThriftCompact().beginStruct()
                .i32(1, DATA_PAGE)                 // PageHeader.type
                .i32(2, data.length)               // uncompressed_page_size (without the header)
                .i32(3, data.length)               // compressed_page_size: the same, uncompressed
                .struct(5)                         // data_page_header: DataPageHeader
                .i32(1, rows.size())               // num_values, nulls included
                .i32(2, PLAIN)                     // encoding
                .i32(3, RLE)                       // definition_level_encoding
                .i32(4, RLE)                       // repetition_level_encoding (none written: max level 0)
                .endStruct()
                .endStruct().toByteArray();
        ByteArrayOutputStream chunk = new ByteArrayOutputStream(header.length + data.length);
        chunk.write(header);
        chunk.write(data);
        return chunk.toByteArray();
    }

    /**
     * Definition levels with bit width 1 as RLE runs of the hybrid encoding (Encodings.md): each run
     * is varint(run length << 1) then the level in one byte (ceil(bit width / 8)).
     */
    private static byte[] definitionLevels(List<? extends List<?>> rows, int index) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int r = 0;
        while (r < rows.size()) {
            int level = rows.get(r).get(index) == null ? 0 : 1;
            int run = 1;
            while (r + run < rows.size() && (rows.get(r + run).get(index) == null ? 0 : 1) == level) {
                run++;
            }
            for (long v = (long) run << 1; ; v >>>= 7) { // ULEB128 varint
                if ((v & ~0x7FL) == 0) {
                    out.write((int) v);
                    break;
                }
                out.write((int) (v & 0x7F | 0x80));
            }
            out.write(level);
            r += run;
        }
        return out.toByteArray();
    }

    /** PLAIN encoding (Encodings.md): INT32 4 bytes and DOUBLE 8 bytes little endian; BYTE_ARRAY length (4 bytes LE) then bytes. */
    private static byte[] plain(Type type, Object value) {
        return switch (type) {
            case INT32 -> littleEndian((Integer) value);
            case DOUBLE -> ByteBuffer.allocate(8).order(ByteOrder.LITTLE_ENDIAN).putDouble((Double) value).array();
            case STRING -> {
                byte[] utf8 = ((String) value).getBytes(StandardCharsets.UTF_8);
                yield ByteBuffer.allocate(4 + utf8.length).order(ByteOrder.LITTLE_ENDIAN).putInt(utf8.length).put(utf8)
                        .array();
            }
        };
    }

    /** FileMetaData (parquet.thrift): the schema, one row group and its column chunks' metadata. */
    private static byte[] fileMetaData(List<Column> columns, int rowCount, List<long[]> chunks, String createdBy) {
        ThriftCompact t = new ThriftCompact().beginStruct()
                .i32(1, 1)                                   // version
                .list(2, ThriftCompact.STRUCT, columns.size() + 1); // schema: the root, then one leaf per column
        t.beginStruct().string(4, "schema").i32(5, columns.size()).endStruct();
        for (Column c : columns) {
            t.beginStruct()
                    .i32(1, c.type().physical)                              // type
                    .i32(3, c.required() ? REQUIRED : OPTIONAL)             // repetition_type
                    .string(4, c.name());                                   // name
            if (c.type() == Type.STRING) {
                t.i32(6, CONVERTED_UTF8)                                    // converted_type
                        .struct(10).struct(1).endStruct().endStruct();      // logicalType: STRING (LogicalTypes.md)
            }
            t.endStruct();
        }
        t.i64(3, rowCount);                                          // num_rows
        long total = chunks.stream().mapToLong(k -> k[1]).sum();
        t.list(4, ThriftCompact.STRUCT, chunks.isEmpty() ? 0 : 1);  // row_groups: one RowGroup, none without rows
        if (chunks.isEmpty()) {
            return t.string(6, createdBy).endStruct().toByteArray();
        }
        t.beginStruct();
        t.list(1, ThriftCompact.STRUCT, columns.size());             // columns: ColumnChunk each
        for (int c = 0; c < columns.size(); c++) {
            Column col = columns.get(c);
            long[] k = chunks.get(c);
            t.beginStruct()
                    .i64(2, 0)                                       // file_offset: deprecated, 0 (no metadata outside the footer)
                    .struct(3)                                       // meta_data: ColumnMetaData
                    .i32(1, col.type().physical)                     // type
                    .list(2, ThriftCompact.I32, 2).i32Element(PLAIN).i32Element(RLE) // encodings
                    .list(3, ThriftCompact.BINARY, 1).stringElement(col.name())     // path_in_schema
                    .i32(4, UNCOMPRESSED)                            // codec
                    .i64(5, rowCount)                                // num_values, nulls included
                    .i64(6, k[1])                                    // total_uncompressed_size, page header included
                    .i64(7, k[1])                                    // total_compressed_size
                    .i64(9, k[0])                                    // data_page_offset
                    .endStruct()
                    .endStruct();
        }
        t.i64(2, total)                                              // total_byte_size
                .i64(3, rowCount)                                    // num_rows
                .i64(5, chunks.get(0)[0])                            // file_offset of the first page
                .i64(6, total)                                       // total_compressed_size
                .endStruct();
        return t.string(6, createdBy)                                // created_by
                .endStruct().toByteArray();
    }

    private static byte[] littleEndian(int value) {
        return ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt(value).array();
    }
}
