package tetrapod.io;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Writes Thrift structs in the compact protocol, as much of it as a Parquet footer needs: structs,
 * lists, i32, i64 and binary (Apache Thrift, "Thrift Compact protocol encoding",
 * doc/specs/thrift-compact-protocol.md). Fields must be written in increasing id order within a struct.
 */
final class ThriftCompact {

    // element and field types of the compact protocol (section "Struct encoding", field types)
    static final int I32 = 5;
    static final int I64 = 6;
    static final int BINARY = 8;
    static final int LIST = 9;
    static final int STRUCT = 12;

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    /** The id of the last field written in each open struct, innermost first. */
    private final Deque<Integer> lastField = new ArrayDeque<>();

    /** Opens the outermost struct, or a struct that is an element of a list. */
    ThriftCompact beginStruct() {
        lastField.push(0);
        return this;
    }

    /** Closes the innermost struct with the stop field (a single 0 byte). */
    ThriftCompact endStruct() {
        out.write(0);
        lastField.pop();
        return this;
    }

    ThriftCompact i32(int id, int value) {
        fieldHeader(id, I32);
        varint(zigzag(value));
        return this;
    }

    ThriftCompact i64(int id, long value) {
        fieldHeader(id, I64);
        varint(zigzag(value));
        return this;
    }

    ThriftCompact string(int id, String value) {
        fieldHeader(id, BINARY);
        binary(value.getBytes(StandardCharsets.UTF_8));
        return this;
    }

    /** A struct-valued field; close it with {@link #endStruct()}. */
    ThriftCompact struct(int id) {
        fieldHeader(id, STRUCT);
        return beginStruct();
    }

    /** A list-valued field of {@code size} elements of {@code elementType}, written next. */
    ThriftCompact list(int id, int elementType, int size) {
        fieldHeader(id, LIST);
        // "List and Set": short form (size < 15) packs the size beside the element type
        if (size < 15) {
            out.write(size << 4 | elementType);
        } else {
            out.write(0xF0 | elementType);
            varint(size);
        }
        return this;
    }

    /** An i32 element of a list (no field header). */
    ThriftCompact i32Element(int value) {
        varint(zigzag(value));
        return this;
    }

    /** A binary element of a list (no field header). */
    ThriftCompact stringElement(String value) {
        binary(value.getBytes(StandardCharsets.UTF_8));
        return this;
    }

    byte[] toByteArray() {
        return out.toByteArray();
    }

    /** "Struct encoding": field id delta 1..15 in the high nibble, else the type byte then the id as zigzag i16. */
    private void fieldHeader(int id, int type) {
        int delta = id - lastField.peek();
        if (delta > 0 && delta <= 15) {
            out.write(delta << 4 | type);
        } else {
            out.write(type);
            varint(zigzag(id));
        }
        lastField.pop();
        lastField.push(id);
    }

    /** "Binary encoding": the length as varint, then the bytes. */
    private void binary(byte[] bytes) {
        varint(bytes.length);
        out.write(bytes, 0, bytes.length);
    }

    /** "Integer encoding": ULEB128, 7 bits a byte, low bits first. */
    private void varint(long value) {
        long v = value;
        while ((v & ~0x7FL) != 0) {
            out.write((int) (v & 0x7F | 0x80));
            v >>>= 7;
        }
        out.write((int) v);
    }

    /** "Integer encoding": zigzag maps signed to unsigned (0, -1, 1, -2 ... to 0, 1, 2, 3 ...). */
    private static long zigzag(int n) {
        return Integer.toUnsignedLong((n << 1) ^ (n >> 31));
    }

    private static long zigzag(long n) {
        return (n << 1) ^ (n >> 63);
    }
}
