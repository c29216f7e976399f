package org.advecta.testing;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * A reference fixture read from the test classpath: a CSV file whose leading {@code #} lines
 * are header comments ({@code # key: value}), followed by a line of column names and one
 * line per row. Inputs are doubles written so that they read back exactly (Python
 * {@code repr}); {@code value} is the exact result as a decimal; {@code flag},
 * {@code cond} and {@code case} classify each row (see {@link Flag}).
 *
 * <p>Cells contain no commas or quotes, so a line is split on commas. The fixtures and the
 * scripts that generate them live under {@code src/test/resources/fixtures/}.
 */
public final class ReferenceTable {

    /** What the exact value of a row is, relative to the double range. */
    public enum Flag {
        /** At least {@link Double#MIN_NORMAL} in magnitude: judged in ULP. */
        NORMAL,
        /** Below {@link Double#MIN_NORMAL}, not below half of {@link Double#MIN_VALUE}. */
        SUBNORMAL,
        /** Below half of {@link Double#MIN_VALUE}: the correctly rounded result is 0. */
        UNDERFLOW,
        /** Exactly 0. */
        ZERO;

        /**
         * Parses a flag cell.
         *
         * @param cell the cell, e.g. {@code normal}
         * @return the flag
         */
        public static Flag parse(String cell) {
            return valueOf(cell.trim().toUpperCase(Locale.ROOT));
        }

        /**
         * Returns the name as written in the files.
         *
         * @return the lower-case name
         */
        public String cell() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    private final String resource;
    private final List<String> comments;
    private final Map<String, String> header;
    private final List<String> columns;
    private final Map<String, Integer> index;
    private final List<Row> rows;

    private ReferenceTable(String resource, List<String> comments, Map<String, String> header,
                           List<String> columns, List<RawLine> lines) {
        this.resource = resource;
        this.comments = Collections.unmodifiableList(comments);
        this.header = Collections.unmodifiableMap(header);
        this.columns = List.copyOf(columns);
        final Map<String, Integer> idx = new LinkedHashMap<>();
        for (int i = 0; i < columns.size(); i++) {
            idx.put(columns.get(i), i);
        }
        this.index = idx;
        final List<Row> built = new ArrayList<>(lines.size());
        for (RawLine l : lines) {
            built.add(new Row(this, l.number, l.text, l.cells));
        }
        this.rows = Collections.unmodifiableList(built);
    }

    /** A data line before the table exists. */
    private static final class RawLine {
        final int number;
        final String text;
        final String[] cells;

        RawLine(int number, String text, String[] cells) {
            this.number = number;
            this.text = text;
            this.cells = cells;
        }
    }

    /**
     * Reads a fixture from the test classpath.
     *
     * @param resource the path below the classpath root, e.g.
     *     {@code fixtures/special/erfc.csv}
     * @return the table
     * @throws IllegalStateException if the resource is missing or malformed
     */
    public static ReferenceTable load(String resource) {
        try (InputStream in = ReferenceTable.class.getResourceAsStream("/" + resource)) {
            if (in == null) {
                throw new IllegalStateException("fixture not on the test classpath: " + resource);
            }
            return parse(resource, new BufferedReader(
                new InputStreamReader(in, StandardCharsets.UTF_8)));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read fixture " + resource, e);
        }
    }

    /**
     * Returns whether a resource exists on the test classpath.
     *
     * @param resource the path below the classpath root
     * @return true if it can be opened
     */
    public static boolean exists(String resource) {
        try (InputStream in = ReferenceTable.class.getResourceAsStream("/" + resource)) {
            return in != null;
        } catch (IOException e) {
            return false;
        }
    }

    private static ReferenceTable parse(String resource, BufferedReader reader)
            throws IOException {
        final List<String> comments = new ArrayList<>();
        final Map<String, String> header = new LinkedHashMap<>();
        List<String> columns = null;
        final List<RawLine> lines = new ArrayList<>();
        String line;
        int number = 0;
        while ((line = reader.readLine()) != null) {
            number++;
            if (line.isBlank()) {
                continue;
            }
            if (line.startsWith("#")) {
                final String text = line.substring(1).trim();
                comments.add(text);
                final int colon = text.indexOf(':');
                if (colon > 0 && columns == null) {
                    header.putIfAbsent(text.substring(0, colon).trim(),
                        text.substring(colon + 1).trim());
                }
                continue;
            }
            final String[] cells = line.split(",", -1);
            if (columns == null) {
                columns = List.of(cells);
                continue;
            }
            if (cells.length != columns.size()) {
                throw new IllegalStateException(resource + ":" + number + ": " + cells.length
                    + " cells, expected " + columns.size());
            }
            lines.add(new RawLine(number, line, cells));
        }
        if (columns == null) {
            throw new IllegalStateException(resource + ": no column line");
        }
        return new ReferenceTable(resource, comments, header, columns, lines);
    }

    /**
     * Returns the classpath resource this table was read from.
     *
     * @return the resource path
     */
    public String resource() {
        return resource;
    }

    /**
     * Returns the file name, e.g. {@code erfc.csv}.
     *
     * @return the last path element of the resource
     */
    public String fileName() {
        return resource.substring(resource.lastIndexOf('/') + 1);
    }

    /**
     * Returns the file name without its extension, e.g. {@code erfc}.
     *
     * @return the base name
     */
    public String baseName() {
        final String f = fileName();
        final int dot = f.lastIndexOf('.');
        return dot > 0 ? f.substring(0, dot) : f;
    }

    /**
     * Returns every header comment line, without the leading {@code #}.
     *
     * @return the comment lines, in order
     */
    public List<String> comments() {
        return comments;
    }

    /**
     * Returns the value of a {@code # key: value} header line.
     *
     * @param key the key, e.g. {@code generator}
     * @return the value, if the header has the key
     */
    public Optional<String> header(String key) {
        return Optional.ofNullable(header.get(key));
    }

    /**
     * Returns the flags the header's {@code # covers:} line claims.
     *
     * @return the claimed flags (empty if there is no such line)
     */
    public Set<Flag> claimedFlags() {
        final Set<Flag> out = EnumSet.noneOf(Flag.class);
        header("covers").ifPresent(s -> {
            for (String f : s.trim().split("\\s+")) {
                if (!f.isEmpty()) {
                    out.add(Flag.parse(f));
                }
            }
        });
        return out;
    }

    /**
     * Returns the column names.
     *
     * @return the columns, in order
     */
    public List<String> columns() {
        return columns;
    }

    /**
     * Returns the rows.
     *
     * @return the rows, in file order
     */
    public List<Row> rows() {
        return rows;
    }

    /**
     * Counts the rows of each flag.
     *
     * @return the counts (flags without rows are absent)
     */
    public Map<Flag, Integer> flagCounts() {
        final Map<Flag, Integer> out = new EnumMap<>(Flag.class);
        for (Row r : rows) {
            out.merge(r.flag(), 1, Integer::sum);
        }
        return out;
    }

    private int column(String name) {
        final Integer i = index.get(name);
        if (i == null) {
            throw new IllegalArgumentException(fileName() + " has no column " + name
                + " (columns: " + columns + ")");
        }
        return i;
    }

    /**
     * Parses a double cell: a Java or Python spelling of a finite double, or {@code inf},
     * {@code -inf}, {@code nan}.
     *
     * @param cell the cell
     * @return the double
     */
    public static double parseDouble(String cell) {
        final String s = cell.trim();
        switch (s.toLowerCase(Locale.ROOT)) {
            case "inf":
            case "+inf":
            case "infinity":
                return Double.POSITIVE_INFINITY;
            case "-inf":
            case "-infinity":
                return Double.NEGATIVE_INFINITY;
            case "nan":
                return Double.NaN;
            default:
                return Double.parseDouble(s);
        }
    }

    /** One line of a fixture. */
    public static final class Row {
        private final ReferenceTable table;
        private final int lineNumber;
        private final String line;
        private final String[] cells;

        private Row(ReferenceTable table, int lineNumber, String line, String[] cells) {
            this.table = table;
            this.lineNumber = lineNumber;
            this.line = line;
            this.cells = cells;
        }

        /**
         * Returns the raw cell of a column.
         *
         * @param column the column name
         * @return the cell text
         */
        public String get(String column) {
            return cells[table.column(column)];
        }

        /**
         * Returns a column as a double (exactly the double written, for input columns).
         *
         * @param column the column name
         * @return the double
         */
        public double getDouble(String column) {
            return parseDouble(get(column));
        }

        /**
         * Returns a column as an exact decimal.
         *
         * @param column the column name
         * @return the decimal
         * @throws NumberFormatException if the cell is not a decimal BigDecimal can hold
         *     (the exponents of far-underflowing values can exceed its range)
         */
        public BigDecimal getDecimal(String column) {
            return new BigDecimal(get(column).trim());
        }

        /**
         * Returns the exact reference value.
         *
         * @return the {@code value} column as a decimal
         */
        public BigDecimal value() {
            return getDecimal("value");
        }

        /**
         * Returns the flag of the exact value.
         *
         * @return the {@code flag} column
         */
        public Flag flag() {
            return Flag.parse(get("flag"));
        }

        /**
         * Returns the componentwise condition number κ (+∞ where the value is 0).
         *
         * @return the {@code cond} column
         */
        public double cond() {
            return getDouble("cond");
        }

        /**
         * Returns what the row exercises.
         *
         * @return the {@code case} column
         */
        public String caseTag() {
            return get("case");
        }

        /**
         * Returns the line number in the file (1-based).
         *
         * @return the line number
         */
        public int lineNumber() {
            return lineNumber;
        }

        /**
         * Returns the line as written.
         *
         * @return the raw line
         */
        public String line() {
            return line;
        }

        @Override
        public String toString() {
            final StringBuilder sb = new StringBuilder();
            sb.append(table.fileName()).append(':').append(lineNumber).append(" [");
            for (int i = 0; i < cells.length; i++) {
                if (i > 0) {
                    sb.append(", ");
                }
                sb.append(table.columns.get(i)).append('=').append(cells[i]);
            }
            return sb.append(']').toString();
        }
    }
}
