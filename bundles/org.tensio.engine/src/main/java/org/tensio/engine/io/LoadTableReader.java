package org.tensio.engine.io;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.units.UnitSystem;

/**
 * Reads the internal forces of a load table, a CSV file as frame and finite-element programs export them
 * (one row per station and load case), into the stations of a project being read. The table's entry in the
 * project file ({@code loadTables}) is described in {@code docs/file-format.md}; {@link ProjectReader}
 * validates it into a {@link Spec}.
 * <p>
 * The file is streamed (never held whole in memory), decoded as strict UTF-8, split by {@link CsvReader}, and
 * every number is checked by a hand-written scanner before it is converted (no regular expression per cell).
 * Limits: at most {@value #MAX_BYTES} bytes (64 MiB, checked before reading and while reading) and at most
 * {@value #MAX_ROWS} data rows; the project at most {@value #MAX_STATION_CASES} station load cases in all. Every error is a {@link ProjectFormatException} at the table's {@code file}
 * key (or at the {@code columns} key concerned) whose message names the file, the 1-based row and the column
 * header, e.g. {@code loads.csv row 1532, column 'Fz': '1.2.3' is not a number}.
 * <p>
 * Values are converted from the table's units to the project's ({@link UnitFactors}: forces by the force
 * factor, moments by force × length) and multiplied by the table's per-component scale. Single use.
 */
final class LoadTableReader {

    /** Largest table file accepted, bytes (64 MiB). */
    static final long MAX_BYTES = 64L * 1024 * 1024;
    /** Most data rows (non-blank rows after the header) accepted in one table. */
    static final int MAX_ROWS = 1_000_000;
    /** Most station load cases (station × case pairs) of a project, the file's and all tables' together. */
    static final int MAX_STATION_CASES = 1_000_000;
    /** The Tensio column keys: station, case, then the force components in {@link ForceComponent} order. */
    static final List<String> COLUMN_KEYS = List.of("station", "case", "N", "Vx", "Vy", "Mx", "My", "T");

    private static final int STATION = 0;
    private static final int CASE = 1;
    private static final int FIRST_COMPONENT = 2;

    /**
     * A validated {@code loadTables} entry.
     *
     * @param index        position in {@code loadTables}, from 0
     * @param path         JSON path of the entry
     * @param file         the file as written in the project (for messages)
     * @param resolved     the file to read; null when the project has no folder
     * @param units        the table's own units
     * @param columns      header name given for a Tensio column key (only those given)
     * @param columnsGiven whether the entry has a {@code columns} object
     * @param delimiter    field separator
     * @param decimal      decimal separator, '.' or ','
     * @param scale        factor per force component, {@link ForceComponent} order
     * @param headerRow    1-based row of the header
     * @param skipUnknown  rows of stations the project does not define are skipped (otherwise an error)
     */
    record Spec(int index, JsonPath path, String file, Path resolved, UnitSystem units, Map<String, String> columns,
            boolean columnsGiven, char delimiter, char decimal, double[] scale, int headerRow, boolean skipUnknown) {
    }

    /**
     * A station being assembled: its cases in order, those of the project file first, and where each table case
     * came from (kept as one long per case, table index × 2³² + row, so that a million rows stay cheap; looked
     * up only to name the first place of a case defined twice).
     */
    static final class StationCases {
        final String id;
        final String sectionId;
        final JsonPath path;
        final boolean forcesGiven;
        final Map<String, InternalForces> cases = new LinkedHashMap<>();
        private int fileCases;
        private long[] origins = new long[0];
        private int tableCases;

        StationCases(String id, String sectionId, JsonPath path, boolean forcesGiven) {
            this.id = id;
            this.sectionId = sectionId;
            this.path = path;
            this.forcesGiven = forcesGiven;
        }

        /** Adds a case of the project file's {@code forces}; they come before any table case. */
        void addFileCase(String caseId, InternalForces f) {
            if (tableCases > 0) {
                throw new IllegalStateException("project-file cases come before table cases");
            }
            cases.put(caseId, f);
            fileCases = cases.size();
        }

        /** @return false (and no change) when the station already has the case */
        boolean addTableCase(String caseId, InternalForces f, int table, int row) {
            if (cases.putIfAbsent(caseId, f) != null) {
                return false;
            }
            if (tableCases == origins.length) {
                origins = java.util.Arrays.copyOf(origins, Math.max(4, 2 * tableCases));
            }
            origins[tableCases++] = ((long) table << 32) | row;
            return true;
        }

        /** @return table index × 2³² + row of a table case, or -1 for a case of the project file */
        long origin(String caseId) {
            int i = 0;
            for (String c : cases.keySet()) {
                if (c.equals(caseId)) {
                    return i < fileCases ? -1 : origins[i - fileCases];
                }
                i++;
            }
            throw new IllegalArgumentException("case: station '" + id + "' has no case '" + caseId + "'");
        }
    }

    private final Spec spec;
    private final List<Spec> all;
    private final Map<String, StationCases> stations;
    private final String suffix;
    private final JsonPath filePath;
    private int headerFields;

    private LoadTableReader(Spec spec, List<Spec> all, Map<String, StationCases> stations, String suffix) {
        this.spec = spec;
        this.all = all;
        this.stations = stations;
        this.suffix = suffix;
        this.filePath = spec.path().child("file");
    }

    /**
     * Reads one table into {@code stations}.
     *
     * @param spec         the table; {@link Spec#resolved()} not null
     * @param all          every table of the project, indexed by {@link Spec#index()} (to name earlier rows)
     * @param stations     the project's stations by id; cases are added to them
     * @param projectUnits units the values are converted to
     * @param sourceSuffix appended to messages, e.g. " (in demo.tensio.json)"
     * @throws ProjectFormatException on any problem with the file or its content, I/O errors included
     */
    static void read(Spec spec, List<Spec> all, Map<String, StationCases> stations, UnitSystem projectUnits,
            String sourceSuffix) throws ProjectFormatException {
        new LoadTableReader(spec, all, stations, sourceSuffix).run(projectUnits);
    }

    private void run(UnitSystem projectUnits) throws ProjectFormatException {
        long size;
        try {
            size = Files.size(spec.resolved());
        } catch (NoSuchFileException e) {
            throw fail(filePath, "load table '" + abbreviate(spec.file()) + "' not found (looked for "
                    + spec.resolved() + ")");
        } catch (IOException | SecurityException e) {
            throw fail(filePath, "cannot read load table '" + abbreviate(spec.file()) + "': " + e);
        }
        if (size > MAX_BYTES) {
            throw tooLarge(size);
        }
        double[] factor = UnitFactors.components(spec.units(), projectUnits);
        for (int i = 0; i < factor.length; i++) {
            factor[i] *= spec.scale()[i];
        }
        CsvReader csv = null;
        try (InputStream raw = Files.newInputStream(spec.resolved());
                Reader text = new InputStreamReader(new Bounded(raw), StandardCharsets.UTF_8.newDecoder()
                        .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT))) {
            csv = new CsvReader(text, spec.delimiter());
            int[] columns = header(csv);
            rows(csv, columns, factor);
        } catch (CsvReader.SyntaxException e) {
            throw fail(filePath, name() + " row " + e.row + ": " + e.getMessage());
        } catch (TooLarge e) {
            throw tooLarge(e.bytes);
        } catch (CharacterCodingException e) {
            throw fail(filePath, name() + " is not valid UTF-8 text (near row " + (csv == null ? 1
                    : Math.max(1, csv.row())) + "); save it as UTF-8");
        } catch (IOException | SecurityException e) {
            throw fail(filePath, "cannot read load table '" + abbreviate(spec.file()) + "': " + e);
        }
    }

    /** @return the field index of each {@link #COLUMN_KEYS} entry, -1 for a component the header lacks */
    private int[] header(CsvReader csv) throws IOException, CsvReader.SyntaxException, ProjectFormatException {
        int h = spec.headerRow();
        while (csv.next()) {
            if (csv.row() == h) {
                break;
            }
        }
        if (csv.row() != h || csv.size() == 0) {
            throw fail(filePath, name() + " has no header row (row " + h + "; the file has " + csv.row()
                    + (csv.row() == 1 ? " row)" : " rows)"));
        }
        if (csv.isBlank()) {
            throw fail(filePath, name() + " row " + h + ": the header row is empty");
        }
        headerFields = csv.size();
        Map<String, Integer> index = new HashMap<>();
        List<String> names = new ArrayList<>(csv.size());
        for (int i = 0; i < csv.size(); i++) {
            String name = csv.get(i);
            names.add(name);
            if (!name.isEmpty()) {
                index.putIfAbsent(name, i);
            }
        }
        JsonPath columnsPath = spec.path().child("columns");
        JsonPath mapping = spec.columnsGiven() ? columnsPath : spec.path();
        int[] at = new int[COLUMN_KEYS.size()];
        String[] readAs = new String[csv.size()];
        boolean anyComponent = false;
        for (int k = 0; k < COLUMN_KEYS.size(); k++) {
            String key = COLUMN_KEYS.get(k);
            boolean explicit = spec.columns().containsKey(key);
            String name = explicit ? spec.columns().get(key) : key;
            Integer i = index.get(name);
            if (i == null) {
                if (explicit) {
                    throw fail(columnsPath.child(key), name() + " row " + h + ": no column '" + abbreviate(name)
                            + "' in the header (columns: " + list(names) + ")");
                }
                if (k < FIRST_COMPONENT) {
                    throw fail(mapping, name() + " row " + h + ": no column '" + key + "' in the header; name the "
                            + key + " column with \"columns\": {\"" + key + "\": \"...\"} (columns: " + list(names)
                            + ")");
                }
                at[k] = -1;
                continue;
            }
            int again = names.subList(i + 1, names.size()).indexOf(name);
            if (again >= 0) {
                throw fail(explicit ? columnsPath.child(key) : filePath, name() + " row " + h + ": the header has "
                        + "column '" + abbreviate(name) + "' twice (fields " + (i + 1) + " and " + (i + 2 + again)
                        + "), so " + key + " is ambiguous");
            }
            if (readAs[i] != null) {
                throw fail(explicit ? columnsPath.child(key) : mapping, name() + " row " + h + ": column '"
                        + abbreviate(name) + "' would be read as both " + readAs[i] + " and " + key + "; map "
                        + (explicit ? readAs[i] : key) + " to another column");
            }
            readAs[i] = key;
            at[k] = i;
            anyComponent |= k >= FIRST_COMPONENT;
        }
        if (!anyComponent) {
            throw fail(mapping, name() + " row " + h + ": none of the force columns "
                    + COLUMN_KEYS.subList(FIRST_COMPONENT, COLUMN_KEYS.size()) + " is in the header (columns: "
                    + list(names) + "); map them with \"columns\"");
        }
        return at;
    }

    private void rows(CsvReader csv, int[] at, double[] factor)
            throws IOException, CsvReader.SyntaxException, ProjectFormatException {
        int needed = 0;
        for (int i : at) {
            needed = Math.max(needed, i + 1);
        }
        String[] header = new String[at.length];
        for (int k = 0; k < at.length; k++) {
            header[k] = spec.columns().getOrDefault(COLUMN_KEYS.get(k), COLUMN_KEYS.get(k));
        }
        Map<String, String> caseIds = new HashMap<>();
        int dataRows = 0;
        long stationCases = 0;
        for (StationCases sc : stations.values()) {
            stationCases += sc.cases.size();
        }
        while (csv.next()) {
            if (csv.isBlank()) {
                continue;
            }
            int row = csv.row();
            if (++dataRows > MAX_ROWS) {
                throw fail(filePath, name() + " has more than " + MAX_ROWS + " data rows (the limit; row " + row
                        + ")");
            }
            if (csv.size() < needed) {
                int missing = -1;
                for (int k = 0; k < at.length; k++) {
                    if (at[k] >= csv.size() && (missing < 0 || at[k] < at[missing])) {
                        missing = k;
                    }
                }
                throw fail(filePath, name() + " row " + row + ": only " + csv.size() + (csv.size() == 1 ? " field"
                        : " fields") + ", so column '" + abbreviate(header[missing]) + "' (field "
                        + (at[missing] + 1) + ") is missing");
            }
            for (int i = headerFields; i < csv.size(); i++) {
                if (!csv.get(i).isEmpty()) {
                    throw fail(filePath, name() + " row " + row + ": " + csv.size() + " fields, but the header has "
                            + headerFields + " (field " + (i + 1) + " is '" + abbreviate(csv.get(i)) + "'; a field "
                            + "holding the delimiter must be quoted)");
                }
            }
            String station = csv.get(at[STATION]);
            if (station.isBlank()) {
                throw fail(filePath, cell(row, header[STATION]) + "the station id is empty");
            }
            StationCases target = stations.get(station);
            if (target == null) {
                if (spec.skipUnknown()) {
                    continue;
                }
                throw fail(filePath, cell(row, header[STATION]) + "unknown station '" + abbreviate(station)
                        + "' (stations: " + list(new ArrayList<>(stations.keySet())) + "; to leave out rows of other "
                        + "stations, set \"unknownStations\": \"skip\")");
            }
            String caseId = csv.get(at[CASE]);
            String known = caseIds.putIfAbsent(caseId, caseId);
            if (known != null) {
                caseId = known; // one String per distinct case id, however many rows name it
            }
            if (caseId.isBlank()) {
                throw fail(filePath, cell(row, header[CASE]) + "the load case id is empty");
            }
            double[] v = new double[FIRST_COMPONENT + ForceComponent.values().length];
            for (int k = FIRST_COMPONENT; k < at.length; k++) {
                if (at[k] < 0) {
                    continue;
                }
                String text = csv.get(at[k]);
                double raw = number(text, spec.decimal());
                if (Double.isNaN(raw)) {
                    throw fail(filePath, cell(row, header[k]) + (text.isEmpty() ? "the cell is empty (write 0)"
                            : "'" + abbreviate(text) + "' is not a number" + (spec.decimal() == ','
                                    ? " (with decimalSeparator ',')" : "")));
                }
                if (Double.isInfinite(raw)) {
                    throw fail(filePath, cell(row, header[k]) + "'" + abbreviate(text) + "' is too large for a "
                            + "double");
                }
                double value = raw * factor[k - FIRST_COMPONENT];
                if (!(Math.abs(value) <= ProjectReader.MAX_ABS_FORCE)) {
                    throw fail(filePath, cell(row, header[k]) + "'" + abbreviate(text) + "' is beyond ±1e30 after "
                            + "conversion to the project's units and scaling (far beyond any real force or moment)");
                }
                v[k] = value + 0.0; // -0.0 (a "-0.000" cell, or 0 times a negative scale) becomes 0
            }
            if (stationCases >= MAX_STATION_CASES) {
                throw fail(filePath, name() + " row " + row + ": the project would have more than "
                        + MAX_STATION_CASES + " station load cases (the limit, the project file's and all tables' "
                        + "together)");
            }
            if (!target.addTableCase(caseId, new InternalForces(v[2], v[3], v[4], v[5], v[6], v[7]), spec.index(),
                    row)) {
                throw fail(filePath, cell(row, header[CASE]) + "station '" + abbreviate(station) + "' has load case '"
                        + abbreviate(caseId) + "' twice: here and at " + describe(target.origin(caseId), target, caseId));
            }
            stationCases++;
        }
    }

    private String describe(long origin, StationCases target, String caseId) {
        if (origin < 0) {
            return target.path.child("forces").child(caseId).toString();
        }
        int table = (int) (origin >>> 32);
        int row = (int) origin;
        return abbreviate(all.get(table).file()) + " row " + row
                + (table == spec.index() ? "" : " ($.loadTables[" + table + "])");
    }

    private String name() {
        return abbreviate(spec.file());
    }

    private String cell(int row, String column) {
        return name() + " row " + row + ", column '" + abbreviate(column) + "': ";
    }

    /**
     * Scans a decimal number: an optional sign, digits with at most one decimal separator (at least one digit),
     * and an optional exponent {@code e} or {@code E} with an optional sign and at least one digit. Nothing else:
     * no spaces, thousands separators, hexadecimal, {@code NaN} or {@code Infinity}.
     *
     * @param s       the cell, trimmed
     * @param decimal the decimal separator, '.' or ','
     * @return the value (correctly rounded by {@link Double#parseDouble}); NaN when {@code s} is not such a
     *         number; ±infinity when it overflows a double
     */
    static double number(String s, char decimal) {
        int n = s.length();
        int i = 0;
        if (n > 0 && (s.charAt(0) == '+' || s.charAt(0) == '-')) {
            i++;
        }
        int digits = 0;
        boolean separator = false;
        for (; i < n; i++) {
            char c = s.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
            } else if (c == decimal && !separator) {
                separator = true;
            } else {
                break;
            }
        }
        if (digits == 0) {
            return Double.NaN;
        }
        if (i < n) {
            char c = s.charAt(i++);
            if (c != 'e' && c != 'E') {
                return Double.NaN;
            }
            if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            int exponent = 0;
            for (; i < n && s.charAt(i) >= '0' && s.charAt(i) <= '9'; i++) {
                exponent++;
            }
            if (exponent == 0 || i < n) {
                return Double.NaN;
            }
        }
        return Double.parseDouble(decimal == '.' ? s : s.replace(decimal, '.'));
    }

    /** @return at most 12 names, abbreviated, as a list */
    private static String list(List<String> names) {
        List<String> shown = new ArrayList<>();
        for (int i = 0; i < names.size() && i < 12; i++) {
            shown.add(abbreviate(names.get(i)));
        }
        String s = shown.toString();
        return names.size() > 12 ? s.substring(0, s.length() - 1) + ", ... (" + names.size() + " in all)]" : s;
    }

    private static String abbreviate(String s) {
        return StrictJson.abbreviate(s);
    }

    private ProjectFormatException tooLarge(long bytes) {
        return fail(filePath, "load table '" + name() + "' is " + bytes + " bytes or more, over the limit of "
                + MAX_BYTES + " bytes (64 MiB); split it into several tables");
    }

    private ProjectFormatException fail(JsonPath p, String message) {
        return new ProjectFormatException(p.toString(), message + suffix);
    }

    /** The file grew past the limit while it was read. */
    private static final class TooLarge extends IOException {
        private static final long serialVersionUID = 1L;
        final long bytes;

        TooLarge(long bytes) {
            super("more than " + MAX_BYTES + " bytes");
            this.bytes = bytes;
        }
    }

    /** Counts the bytes read and stops past {@link #MAX_BYTES}. */
    private static final class Bounded extends FilterInputStream {
        private long count;

        Bounded(InputStream in) {
            super(in);
        }

        @Override
        public int read() throws IOException {
            int b = super.read();
            if (b >= 0) {
                grow(1);
            }
            return b;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            int n = super.read(b, off, len);
            if (n > 0) {
                grow(n);
            }
            return n;
        }

        private void grow(int n) throws TooLarge {
            count += n;
            if (count > MAX_BYTES) {
                throw new TooLarge(count);
            }
        }
    }
}
