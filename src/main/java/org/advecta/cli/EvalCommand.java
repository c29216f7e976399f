package org.advecta.cli;

import java.io.BufferedWriter;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.advecta.quadrature.Estimate;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code advecta eval FAMILY key=value ...}: evaluates a family at the points of a CSV table
 * and writes the table back with the concentration (and, on request, gradient and flux)
 * appended.
 */
@Command(name = "eval", mixinStandardHelpOptions = true,
    description = {
        "Evaluate a solution family at points read as CSV.",
        "The header names the coordinate columns among x, y, z, t (the family's own: "
            + "see 'advecta list'); other columns are passed through. Each row is written "
            + "back with the column c appended (then dcdx, dcdy, dcdz with --gradient and "
            + "jx, jy, jz with --flux; c_error, the quadrature error bound, with --error). "
            + "Numbers are printed so that they read back to the identical double.",
        "With steady=true (continuous sources) t is not a coordinate: the t column may be "
            + "left out, and if present it is passed through unread."},
    footer = {"", "Example:",
        "  printf 'x,t\\n0.5,2\\n1.0,2\\n' | advecta eval inlet-third v=0.6 D=0.005 R=1.5"})
final class EvalCommand implements Callable<Integer> {

    /** The format of input and output tables: comma-separated, '#' starts a comment line. */
    static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder()
        .setCommentMarker('#')
        .setIgnoreEmptyLines(true)
        .setIgnoreSurroundingSpaces(true)
        .setRecordSeparator("\n")
        .get();

    private final Main.Io io;

    @Parameters(index = "0", paramLabel = "FAMILY", description = "solution family (see list)")
    private String familyName;

    @Parameters(index = "1..*", arity = "0..*", paramLabel = "KEY=VALUE",
        description = "parameters, e.g. v=0.6 D=0.005 (see list)")
    private List<String> assignments = new ArrayList<>();

    @Option(names = {"-i", "--input"}, paramLabel = "FILE",
        description = "points CSV; - for standard input (default)")
    private String input = "-";

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
        description = "result CSV; - for standard output (default)")
    private String output = "-";

    @Option(names = "--gradient", description = "append the gradient columns")
    private boolean gradient;

    @Option(names = "--flux", description = "append the total-flux columns")
    private boolean flux;

    @Option(names = "--error", description = "append c_error, the error bound of a value "
        + "computed by quadrature (line-source-2d, patch-source-3d)")
    private boolean error;

    /**
     * Creates the command.
     *
     * @param io the streams to use
     */
    EvalCommand(Main.Io io) {
        this.io = io;
    }

    @Override
    public Integer call() {
        final Family family = Families.find(familyName);
        final Params params = Params.of(family, assignments(assignments));
        final Field field = family.create(params);
        if ((gradient || flux) && !field.hasDerivatives()) {
            throw new UserError("family " + family.name() + " has values only: no "
                + (gradient ? "--gradient" : "--flux") + " (a continuous source's gradient "
                + "and flux are not available)");
        }
        if (error && !field.hasErrorBound()) {
            throw new UserError("--error: family " + family.name()
                + (field.steady() ? " with steady = true" : "") + " is computed in closed "
                + "form, without a quadrature error bound (see 'advecta list')");
        }
        final String source = "-".equals(input) ? "standard input" : input;
        if ("-".equals(output)) {
            final ByteArrayOutputStream buffer = new ByteArrayOutputStream();
            try {
                evaluate(field, source, buffer);
            } catch (IOException e) {
                throw new UserError("cannot read " + source + ": " + Main.reason(e), e);
            }
            io.out().write(buffer.toByteArray(), 0, buffer.size());
            io.out().flush();
        } else {
            AtomicOutput.write(Path.of(output), out -> evaluate(field, source, out));
        }
        return 0;
    }

    /**
     * Splits {@code key=value} arguments.
     *
     * @param args the arguments
     * @return key to value text, in the order given
     * @throws UserError on an argument without '=', an empty key or a repeated key
     */
    static Map<String, Object> assignments(List<String> args) {
        final Map<String, Object> raw = new LinkedHashMap<>();
        for (String a : args) {
            final int eq = a.indexOf('=');
            if (eq < 0) {
                throw new UserError("expected key=value, got '" + a + "'");
            }
            final String key = a.substring(0, eq).strip();
            if (key.isEmpty()) {
                throw new UserError("expected key=value, got '" + a + "'");
            }
            if (raw.put(key, a.substring(eq + 1)) != null) {
                throw new UserError("parameter " + key + " given twice");
            }
        }
        return raw;
    }

    private void evaluate(Field field, String source, OutputStream sink) throws IOException {
        try (Reader reader = open(source)) {
            final Writer writer = new BufferedWriter(
                new OutputStreamWriter(sink, StandardCharsets.UTF_8));
            try (CSVParser parser = CSVParser.builder().setReader(reader).setFormat(FORMAT)
                    .get()) {
                evaluate(field, source, parser, writer);
            } catch (UncheckedIOException e) {
                throw malformed(source, e.getCause());
            }
            writer.flush();
        }
    }

    private Reader open(String source) {
        if ("-".equals(input)) {
            return new InputStreamReader(io.in(), StandardCharsets.UTF_8);
        }
        try {
            return Files.newBufferedReader(Path.of(input), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UserError("cannot read " + source + ": " + Main.reason(e), e);
        }
    }

    private static UserError malformed(String source, IOException e) {
        // commons-csv reports the line in its message, e.g. "(line 3) invalid char ...".
        return new UserError(source + ": malformed CSV: " + Main.reason(e), e);
    }

    private void evaluate(Field field, String source, CSVParser parser, Writer printer)
            throws IOException {
        final java.util.Iterator<CSVRecord> records = parser.iterator();
        if (!records.hasNext()) {
            throw new UserError(source + ": no header line (expected e.g. "
                + String.join(",", coordinates(field)) + ")");
        }
        final CSVRecord headerRecord = records.next();
        final List<String> header = new ArrayList<>();
        headerRecord.forEach(h -> header.add(h.strip()));
        final int[] column = coordinateColumns(field, source, header);
        final List<String> out = new ArrayList<>(header);
        final int d = field.dimensions();
        out.add("c");
        if (error) {
            out.add("c_error");
        }
        if (gradient) {
            for (int k = 0; k < d; k++) {
                out.add("dcd" + AXES[k]);
            }
        }
        if (flux) {
            for (int k = 0; k < d; k++) {
                out.add("j" + AXES[k]);
            }
        }
        for (String name : out.subList(header.size(), out.size())) {
            if (header.contains(name)) {
                throw new UserError(source + ": the input already has a column " + name);
            }
        }
        FORMAT.printRecord(printer, out.toArray());
        final double[] coordinates = new double[4];
        final double[] vector = new double[3];
        final List<String> row = new ArrayList<>(out.size());
        while (records.hasNext()) {
            final CSVRecord r = records.next();
            final long line = parser.getCurrentLineNumber();
            if (r.size() != header.size()) {
                throw new UserError(String.format(java.util.Locale.ROOT,
                    "%s: line %d: expected %d fields, found %d", source, line, header.size(),
                    r.size()));
            }
            for (int k = 0; k < 4; k++) {
                coordinates[k] = column[k] < 0 ? 0.0
                    : cell(source, line, header.get(column[k]), r.get(column[k]));
            }
            row.clear();
            r.forEach(row::add);
            try {
                final double x = coordinates[0];
                final double y = coordinates[1];
                final double z = coordinates[2];
                final double t = coordinates[3];
                if (error) {
                    final Estimate e = field.estimate(x, y, z, t);
                    row.add(Double.toString(e.value()));
                    row.add(Double.toString(e.error()));
                } else {
                    row.add(Double.toString(field.value(x, y, z, t)));
                }
                if (gradient) {
                    field.gradient(x, y, z, t, vector);
                    addAll(row, vector, d);
                }
                if (flux) {
                    field.flux(x, y, z, t, vector);
                    addAll(row, vector, d);
                }
            } catch (IllegalArgumentException | IllegalStateException e) {
                throw new UserError(source + ": line " + line + ": " + e.getMessage(), e);
            }
            FORMAT.printRecord(printer, row.toArray());
        }
    }

    private static void addAll(List<String> row, double[] vector, int d) {
        for (int k = 0; k < d; k++) {
            row.add(Double.toString(vector[k]));
        }
    }

    private static final String[] AXES = {"x", "y", "z", "t"};

    private static List<String> coordinates(Field field) {
        final List<String> names = new ArrayList<>(List.of(AXES).subList(0, field.dimensions()));
        if (!field.steady()) {
            names.add("t");
        }
        return names;
    }

    /**
     * Finds the coordinate columns: index of x, y, z, t in the header, −1 where absent.
     */
    private static int[] coordinateColumns(Field field, String source, List<String> header) {
        final int[] column = new int[4];
        final List<String> needed = coordinates(field);
        for (int k = 0; k < 4; k++) {
            if (k == 3 && field.steady()) {
                // a steady state has no time: a t column passes through unread
                column[k] = -1;
                continue;
            }
            column[k] = header.indexOf(AXES[k]);
            if (column[k] >= 0 && header.lastIndexOf(AXES[k]) != column[k]) {
                throw new UserError(source + ": column " + AXES[k] + " appears twice");
            }
            if (column[k] < 0 && needed.contains(AXES[k])) {
                throw new UserError(source + ": no column " + AXES[k] + " (a "
                    + field.dimensions() + "D family needs " + String.join(", ", needed) + ")");
            }
            if (column[k] >= 0 && !needed.contains(AXES[k])) {
                throw new UserError(source + ": column " + AXES[k] + " is not a coordinate of a "
                    + field.dimensions() + "D family (it needs " + String.join(", ", needed)
                    + ")");
            }
        }
        return column;
    }

    /**
     * Parses one numeric cell of a table.
     *
     * @param source the table's name for messages
     * @param line the cell's line number
     * @param name the column's name
     * @param text the cell
     * @return the number (possibly infinite for a literal such as 1e999)
     * @throws UserError naming the line and column if the cell is empty or not a number
     */
    static double cell(String source, long line, String name, String text) {
        final String s = text.strip();
        if (s.isEmpty()) {
            throw new UserError(source + ": line " + line + ": column " + name
                + ": missing value");
        }
        if (!ParamSpec.isDecimal(s)) {
            throw new UserError(source + ": line " + line + ": column " + name + " = '" + s
                + "': not a number");
        }
        return Double.parseDouble(s);
    }
}
