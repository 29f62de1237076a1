package dev.noninertial.site;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A small reader for JSON text (RFC 8259), enough for the JMH results file: objects become
 * {@link Map}s (in file order), arrays {@link List}s, numbers {@link Double}s, and strings,
 * booleans and null themselves. Malformed input is refused with the offset of the problem.
 *
 * <p>Thread-safe: each call reads its own text.
 */
public final class JsonText {

    private final String text;
    private int at;

    private JsonText(String text) {
        this.text = text;
    }

    /**
     * Reads one JSON value.
     *
     * @param text the JSON text
     * @return the value
     * @throws IllegalArgumentException if the text is not valid JSON
     */
    public static Object parse(String text) {
        JsonText r = new JsonText(text);
        r.blanks();
        Object v = r.value();
        r.blanks();
        if (r.at != text.length()) {
            throw r.error("text after the value");
        }
        return v;
    }

    private Object value() {
        if (at >= text.length()) {
            throw error("unexpected end");
        }
        char c = text.charAt(at);
        switch (c) {
            case '{':
                return object();
            case '[':
                return array();
            case '"':
                return string();
            case 't':
                return word("true", Boolean.TRUE);
            case 'f':
                return word("false", Boolean.FALSE);
            case 'n':
                return word("null", null);
            default:
                return number();
        }
    }

    private Map<String, Object> object() {
        Map<String, Object> m = new LinkedHashMap<>();
        at++;
        blanks();
        if (peek() == '}') {
            at++;
            return m;
        }
        while (true) {
            blanks();
            if (peek() != '"') {
                throw error("expected a member name");
            }
            String key = string();
            blanks();
            expect(':');
            blanks();
            m.put(key, value());
            blanks();
            if (peek() == ',') {
                at++;
            } else {
                expect('}');
                return m;
            }
        }
    }

    private List<Object> array() {
        List<Object> list = new ArrayList<>();
        at++;
        blanks();
        if (peek() == ']') {
            at++;
            return list;
        }
        while (true) {
            blanks();
            list.add(value());
            blanks();
            if (peek() == ',') {
                at++;
            } else {
                expect(']');
                return list;
            }
        }
    }

    private String string() {
        expect('"');
        StringBuilder b = new StringBuilder();
        while (true) {
            if (at >= text.length()) {
                throw error("unterminated string");
            }
            char c = text.charAt(at++);
            if (c == '"') {
                return b.toString();
            }
            if (c != '\\') {
                b.append(c);
                continue;
            }
            char e = text.charAt(at++);
            switch (e) {
                case 'n' -> b.append('\n');
                case 't' -> b.append('\t');
                case 'r' -> b.append('\r');
                case 'b' -> b.append('\b');
                case 'f' -> b.append('\f');
                case 'u' -> {
                    b.append((char) Integer.parseInt(text.substring(at, at + 4), 16));
                    at += 4;
                }
                default -> b.append(e);
            }
        }
    }

    private Object word(String w, Object v) {
        if (!text.startsWith(w, at)) {
            throw error("expected " + w);
        }
        at += w.length();
        return v;
    }

    private Double number() {
        int start = at;
        while (at < text.length() && "+-0123456789.eE".indexOf(text.charAt(at)) >= 0) {
            at++;
        }
        String n = text.substring(start, at);
        if (n.isEmpty()) {
            // JMH writes "NaN" for an undefined error as a string; a bare word is not JSON
            throw error("unexpected character '" + text.charAt(start) + "'");
        }
        try {
            return Double.valueOf(n);
        } catch (NumberFormatException e) {
            throw error("bad number " + n);
        }
    }

    private char peek() {
        if (at >= text.length()) {
            throw error("unexpected end");
        }
        return text.charAt(at);
    }

    private void expect(char c) {
        if (peek() != c) {
            throw error("expected '" + c + "'");
        }
        at++;
    }

    private void blanks() {
        while (at < text.length() && Character.isWhitespace(text.charAt(at))) {
            at++;
        }
    }

    private IllegalArgumentException error(String what) {
        return new IllegalArgumentException("JSON: " + what + " at offset " + at);
    }
}
