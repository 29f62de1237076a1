package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15, class 6: every refusal of the motion log reader names file, line and column, says
 * which separator it found, shows invisible characters and stays short. Check values: UTF-8
 * (RFC 3629, section 3: 0xC3 must be followed by a continuation byte 0x80..0xBF, so C3 28 is
 * malformed); 1e-999 is below the smallest subnormal double 4.9e-324 (IEEE 754 binary64).
 */
class HostileLogTest {

    private static final String HEADER = "t[s], x[m], y[m], z[m], q0[1], q1[1], q2[1], q3[1]\n";

    private static String refusal(String text) {
        return assertThrows(IllegalArgumentException.class,
                () -> SampledMotion.readCsv(new StringReader(text), "trial.csv")).getMessage();
    }

    @Test
    void malformedEncodingNamesFileLineAndColumn(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("bad-bytes.csv");
        byte[] head = (HEADER + "0, 0, 0, 0, 1, 0, 0, 0\n1, ").getBytes(StandardCharsets.US_ASCII);
        byte[] bad = {(byte) 0xC3, (byte) 0x28};
        byte[] tail = ", 0, 0, 1, 0, 0, 0\n".getBytes(StandardCharsets.US_ASCII);
        byte[] all = new byte[head.length + bad.length + tail.length];
        System.arraycopy(head, 0, all, 0, head.length);
        System.arraycopy(bad, 0, all, head.length, bad.length);
        System.arraycopy(tail, 0, all, head.length + bad.length, tail.length);
        Files.write(file, all);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SampledMotion.readCsv(file));
        assertTrue(e.getMessage().contains("bad-bytes.csv line 3, column 4: malformed UTF-8"), e.getMessage());
    }

    @Test
    void anotherSeparatorIsNamed() {
        String m = refusal("t[s]; x[m]; y[m]; z[m]; q0[1]; q1[1]; q2[1]; q3[1]\n0;0;0;0;1;0;0;0\n");
        assertTrue(m.contains("trial.csv line 1, column 5: the fields are separated by semicolons"), m);
        m = refusal("t[s]\tx[m]\ty[m]\tz[m]\tq0[1]\tq1[1]\tq2[1]\tq3[1]\n");
        assertTrue(m.contains("separated by tabs"), m);
    }

    @Test
    void invisibleCharactersAreShownAndMessagesStayShort() {
        String m = refusal(HEADER + "0, 0, 0, 0, 1, 0, 0, 0\n1, 2\u00a0, 0, 0, 1, 0, 0, 0\n");
        assertTrue(m.contains("line 3, column x") && m.contains("'2U+00A0'"), m);
        m = refusal(HEADER + "0, 0, 0, 0, 1, 0\u0000, 0, 0\n");
        assertTrue(m.contains("line 2, column 17: NUL character (U+0000)"), m);
        String huge = "9".repeat(10_000_000) + "x";
        m = refusal(HEADER + "0, " + huge + ", 0, 0, 1, 0, 0, 0\n");
        // a 10 MB field: the message quotes 40 characters and counts the rest
        assertTrue(m.length() < 400, "message of " + m.length() + " characters");
        assertTrue(m.contains("(9999961 more characters)"), m.substring(0, Math.min(300, m.length())));
    }

    @Test
    void aNonZeroLiteralThatUnderflowsIsRefused() {
        String m = refusal(HEADER + "0, 1e-999, 0, 0, 1, 0, 0, 0\n1, 0, 0, 0, 1, 0, 0, 0\n");
        assertTrue(m.contains("line 2, column x") && m.contains("underflows to zero"), m);
        // a true zero with an exponent stays zero
        SampledMotion ok = SampledMotion.fromArrays(new double[] {0, 1}, new double[6], new double[] {1, 0, 0, 0, 1, 0, 0, 0});
        assertEquals(0.0, ok.at(0.5).origin().getX(), 0.0);
        assertEquals(0.0, LogText.number("0e-999", 0, 6, "s", 1, "x"), 0.0);
        // the smallest subnormal itself is representable and read exactly
        assertEquals(Double.MIN_VALUE, LogText.number("4.9e-324", 0, 8, "s", 1, "x"), 0.0);
    }
}
