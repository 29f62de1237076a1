package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The motion-log number reader gives bit-identical results to the JDK's Double.parseDouble (the
 * independent reference, correctly rounded by its specification) and refuses what is not a plain
 * decimal number.
 */
class MotionLogDecimalTest {

    private static void same(String text) {
        double expected = Double.parseDouble(text.trim());
        double got = MotionLogFile.decimal(text, 0, text.length());
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(got), text);
    }

    @Test
    void agreesBitForBitWithTheJdk() {
        Random random = new Random(2026);
        for (int k = 0; k < 20000; k++) {
            double x = (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(24) - 12);
            int decimals = random.nextInt(18);
            same(String.format(Locale.ROOT, "%." + decimals + "f", x));
            same(String.format(Locale.ROOT, "%." + decimals + "e", x));
            same(Double.toString(x));
        }
        for (String s : new String[] {"0", "-0", "+0.0", "1", "-1.5", " 120.1915 ", "\t3.2e-4", "1E5", "1e+5",
            ".5", "5.", "00012.50", "123456789012345678901234567890", "1e22", "1e23", "9007199254740993",
            "4.9e-324", "2.2250738585072014E-308", "1.7976931348623157e308", "0.1", "0.3", "-40.041885"}) {
            same(s);
        }
    }

    @Test
    void refusesAnythingElse() {
        for (String s : new String[] {"", " ", "-", "+", ".", "e5", "1e", "1e+", "1.2.3", "1,5", "0x1p3",
            "NaN", "Infinity", "-Infinity", "1d", "1f", "12a", "1 2", "--1", "1e5.0"}) {
            assertTrue(Double.isNaN(MotionLogFile.decimal(s, 0, s.length())), "'" + s + "'");
        }
    }
}
