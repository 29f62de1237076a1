package dev.noninertial.frames;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;

/**
 * Crafts hostile serialized streams for tests: serialize a good object, then replace the eight
 * big-endian bytes of one double value by those of another (the stream format writes doubles
 * that way, Java Object Serialization Specification, section 6.4 "Grammar for the stream format":
 * primitive field values are written as by {@code DataOutput}).
 */
public final class StreamPatch {

    private StreamPatch() {
    }

    /** @return the serialized bytes of {@code value} */
    public static byte[] bytes(Object value) {
        try {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            try (ObjectOutputStream o = new ObjectOutputStream(out)) {
                o.writeObject(value);
            }
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Reads one object from the bytes. */
    public static Object read(byte[] bytes) throws IOException, ClassNotFoundException {
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes))) {
            return in.readObject();
        }
    }

    /** Serializes and reads back. */
    public static Object roundTrip(Object value) throws IOException, ClassNotFoundException {
        return read(bytes(value));
    }

    /**
     * Replaces occurrence {@code which} (0 for the first) of the double {@code from} by {@code to}.
     *
     * @throws IllegalStateException if the stream holds fewer occurrences
     */
    public static byte[] replaceDouble(byte[] stream, double from, double to, int which) {
        byte[] f = ByteBuffer.allocate(8).putDouble(from).array();
        byte[] t = ByteBuffer.allocate(8).putDouble(to).array();
        byte[] out = stream.clone();
        int seen = 0;
        for (int i = 0; i + 8 <= out.length; i++) {
            boolean match = true;
            for (int k = 0; k < 8 && match; k++) {
                match = out[i + k] == f[k];
            }
            if (match) {
                if (seen == which) {
                    System.arraycopy(t, 0, out, i, 8);
                    return out;
                }
                seen++;
            }
        }
        throw new IllegalStateException("the stream holds " + seen + " occurrences of " + from);
    }

    /** Replaces the only occurrence of {@code from}; refuses a stream holding it more than once. */
    public static byte[] replaceDouble(byte[] stream, double from, double to) {
        byte[] once = replaceDouble(stream, from, to, 0);
        boolean second;
        try {
            replaceDouble(once, from, to, 0);
            second = true;
        } catch (IllegalStateException e) {
            second = false;
        }
        if (second) {
            throw new IllegalStateException(from + " occurs more than once in the stream");
        }
        return once;
    }
}
