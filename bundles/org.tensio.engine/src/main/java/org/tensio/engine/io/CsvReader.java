package org.tensio.engine.io;

import java.io.IOException;
import java.io.Reader;

/**
 * A streaming reader of delimiter-separated text as RFC 4180 describes it, one record at a time, with the
 * tolerances of real exports:
 * <ul>
 * <li>records end with CR LF, LF or a lone CR; a byte-order mark (U+FEFF) at the very start is skipped;</li>
 * <li>a field may be quoted with {@code "}; inside quotes the delimiter, line breaks and doubled quotes
 * {@code ""} (one quote) are field content; spaces around a quoted field are ignored;</li>
 * <li>unquoted fields are trimmed of spaces (and of tabs, unless the tab is the delimiter);</li>
 * <li>a quote inside an unquoted field, text after a closing quote and an unterminated quote are errors.</li>
 * </ul>
 * Rows are numbered from 1 by record, as a spreadsheet numbers them: every record counts, blank ones
 * included, and a record whose quoted field spans several lines is one row. Limits: at most
 * {@value #MAX_FIELD_CHARS} characters in a field and {@value #MAX_FIELDS} fields in a record. The reader does
 * not interpret the fields. Single use, not thread-safe.
 */
final class CsvReader {

    /** Longest field accepted, characters. */
    static final int MAX_FIELD_CHARS = 10_000;
    /** Most fields accepted in one record. */
    static final int MAX_FIELDS = 10_000;

    /** A syntax error or an exceeded limit, at a row (from 1) and a field (from 0). */
    static final class SyntaxException extends Exception {
        private static final long serialVersionUID = 1L;
        final int row;
        final int field;

        SyntaxException(int row, int field, String message) {
            super(message);
            this.row = row;
            this.field = field;
        }
    }

    private static final int EOF = -1;

    private final Reader in;
    private final char delimiter;
    private final char[] buffer = new char[1 << 16];
    private int position;
    private int limit;
    private boolean started;
    private int row;
    private int nextRow = 1;
    private String[] fields = new String[16];
    private int count;
    private final StringBuilder field = new StringBuilder();

    /**
     * @param in        the text, read through to its end (not closed here)
     * @param delimiter the field separator, e.g. {@code ','}; must not be a quote, CR or LF
     */
    CsvReader(Reader in, char delimiter) {
        if (delimiter == '"' || delimiter == '\r' || delimiter == '\n') {
            throw new IllegalArgumentException("delimiter: character " + (int) delimiter + " cannot separate fields");
        }
        this.in = in;
        this.delimiter = delimiter;
    }

    /**
     * Reads the next record.
     *
     * @return false at the end of the text (nothing after the last line break)
     * @throws IOException     from the underlying reader
     * @throws SyntaxException on malformed quoting or an exceeded limit
     */
    boolean next() throws IOException, SyntaxException {
        if (!started) {
            started = true;
            if (peek() == '\uFEFF') {
                position++;
            }
        }
        count = 0;
        if (peek() == EOF) {
            return false;
        }
        row = nextRow;
        while (true) {
            if (count == MAX_FIELDS) {
                throw new SyntaxException(row, count, "more than " + MAX_FIELDS + " fields in one row");
            }
            int end = readField();
            if (end == delimiter) {
                position++;
                continue;
            }
            if (end == '\r') {
                position++;
                if (peek() == '\n') {
                    position++;
                }
            } else if (end == '\n') {
                position++;
            }
            nextRow++;
            return true;
        }
    }

    /** Reads one field into {@link #fields}; @return the character that ended it, not consumed (or EOF) */
    private int readField() throws IOException, SyntaxException {
        field.setLength(0);
        int c = peek();
        while (isSpace(c)) {
            position++;
            c = peek();
        }
        if (c == '"') {
            position++;
            while (true) {
                c = peek();
                if (c == EOF) {
                    throw new SyntaxException(row, count, "a quoted field is not closed (the quote opens in row "
                            + row + ")");
                }
                position++;
                if (c == '"') {
                    if (peek() == '"') {
                        position++;
                        append('"');
                    } else {
                        break;
                    }
                } else {
                    append((char) c);
                }
            }
            c = peek();
            while (isSpace(c)) {
                position++;
                c = peek();
            }
            if (c != EOF && c != delimiter && c != '\r' && c != '\n') {
                throw new SyntaxException(row, count, "unexpected '" + (char) c + "' after a closing quote (a quote "
                        + "inside a quoted field is written \"\")");
            }
            add(field.toString());
            return c;
        }
        while (c != EOF && c != delimiter && c != '\r' && c != '\n') {
            if (c == '"') {
                throw new SyntaxException(row, count, "a quote inside an unquoted field (quote the whole field and "
                        + "double the quotes inside it)");
            }
            append((char) c);
            position++;
            c = peek();
        }
        int end = field.length();
        while (end > 0 && isSpace(field.charAt(end - 1))) {
            end--;
        }
        add(field.substring(0, end));
        return c;
    }

    private boolean isSpace(int c) {
        return c == ' ' || (c == '\t' && delimiter != '\t');
    }

    private void append(char c) throws SyntaxException {
        if (field.length() == MAX_FIELD_CHARS) {
            throw new SyntaxException(row, count, "a field longer than " + MAX_FIELD_CHARS + " characters");
        }
        field.append(c);
    }

    private void add(String value) {
        if (count == fields.length) {
            String[] bigger = new String[2 * count];
            System.arraycopy(fields, 0, bigger, 0, count);
            fields = bigger;
        }
        fields[count++] = value;
    }

    private int peek() throws IOException {
        if (position == limit) {
            int n;
            do {
                n = in.read(buffer, 0, buffer.length);
            } while (n == 0);
            position = 0;
            limit = Math.max(n, 0);
            if (n < 0) {
                return EOF;
            }
        }
        return buffer[position];
    }

    /** @return the 1-based row number of the current record (after the end: of the last record; 0 if none) */
    int row() {
        return row;
    }

    /** @return the number of fields of the current record (a blank line has one, empty; 0 after the end) */
    int size() {
        return count;
    }

    /** @return field {@code i} (from 0) of the current record */
    String get(int i) {
        if (i < 0 || i >= count) {
            throw new IndexOutOfBoundsException("field " + i + " of " + count);
        }
        return fields[i];
    }

    /** @return true when every field of the current record is empty (a blank line, or only delimiters) */
    boolean isBlank() {
        for (int i = 0; i < count; i++) {
            if (!fields[i].isEmpty()) {
                return false;
            }
        }
        return true;
    }
}
