package org.advecta.cli;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * A CSV table read whole, in the format of {@code eval} ({@link EvalCommand#FORMAT}: a header
 * line, comma-separated fields, '#' comment lines and blank lines skipped), with the line
 * number of every row for messages. Cells stay text until a command asks for a number, so
 * columns the command does not use are passed through verbatim. Not thread-safe to build;
 * immutable once read.
 */
final class DataTable {

    private final String source;
    private final List<String> header;
    private final List<List<String>> rows;
    private final List<Long> lines;

    private DataTable(String source, List<String> header, List<List<String>> rows,
                      List<Long> lines) {
        this.source = source;
        this.header = Collections.unmodifiableList(header);
        this.rows = Collections.unmodifiableList(rows);
        this.lines = Collections.unmodifiableList(lines);
    }

    /**
     * Reads a table.
     *
     * @param file the CSV file
     * @return the table
     * @throws UserError if the file cannot be read, is not valid CSV, has no header, repeats
     *     a column name or has a row with a different number of fields than the header
     *     (naming its line)
     */
    static DataTable read(Path file) {
        final String source = file.toString();
        try (Reader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser parser = CSVParser.builder().setReader(reader)
                 .setFormat(EvalCommand.FORMAT).get()) {
            final Iterator<CSVRecord> records = parser.iterator();
            if (!records.hasNext()) {
                throw new UserError(source + ": no header line");
            }
            final List<String> header = new ArrayList<>();
            records.next().forEach(h -> header.add(h.strip()));
            for (int k = 0; k < header.size(); k++) {
                if (header.lastIndexOf(header.get(k)) != k) {
                    throw new UserError(source + ": column " + header.get(k) + " appears twice");
                }
            }
            final List<List<String>> rows = new ArrayList<>();
            final List<Long> lines = new ArrayList<>();
            while (records.hasNext()) {
                final CSVRecord r = records.next();
                final long line = parser.getCurrentLineNumber();
                if (r.size() != header.size()) {
                    throw new UserError(String.format(Locale.ROOT,
                        "%s: line %d: expected %d fields, found %d", source, line,
                        header.size(), r.size()));
                }
                final List<String> row = new ArrayList<>(r.size());
                r.forEach(row::add);
                rows.add(Collections.unmodifiableList(row));
                lines.add(line);
            }
            return new DataTable(source, header, rows, lines);
        } catch (UncheckedIOException e) {
            // commons-csv reports the line in its message, e.g. "(line 3) invalid char ...".
            throw new UserError(source + ": malformed CSV: " + Main.reason(e.getCause()), e);
        } catch (IOException e) {
            throw new UserError("cannot read " + source + ": " + Main.reason(e), e);
        }
    }

    /**
     * Returns the name used in messages.
     *
     * @return the file name as given
     */
    String source() {
        return source;
    }

    /**
     * Returns the column names.
     *
     * @return the header, stripped
     */
    List<String> header() {
        return header;
    }

    /**
     * Returns the number of data rows.
     *
     * @return the count
     */
    int size() {
        return rows.size();
    }

    /**
     * Returns a row's cells as read.
     *
     * @param row the row index
     * @return the cells
     */
    List<String> row(int row) {
        return rows.get(row);
    }

    /**
     * Returns the line a row was read from.
     *
     * @param row the row index
     * @return the line number, 1-based, counting comment and blank lines
     */
    long line(int row) {
        return lines.get(row);
    }

    /**
     * Returns the index of a column.
     *
     * @param name the column's name
     * @return the index, or −1 if the table has no such column
     */
    int column(String name) {
        return header.indexOf(name);
    }

    /**
     * Returns the index of a column that must be there.
     *
     * @param name the column's name
     * @param needed every column needed, for the message
     * @return the index
     * @throws UserError if the column is missing
     */
    int required(String name, Collection<String> needed) {
        final int k = header.indexOf(name);
        if (k < 0) {
            throw new UserError(source + ": no column " + name + " (needed: "
                + String.join(", ", needed) + ")");
        }
        return k;
    }

    /**
     * Rejects columns that would be ambiguous or would clash with what a command appends.
     *
     * @param names the forbidden names
     * @param why why each is forbidden, for the message
     * @throws UserError naming the first forbidden column found
     */
    void forbid(Collection<String> names, String why) {
        for (String n : names) {
            if (header.contains(n)) {
                throw new UserError(source + ": column " + n + ": " + why);
            }
        }
    }

    /**
     * Returns a finite number from a cell.
     *
     * @param row the row index
     * @param column the column index
     * @return the number
     * @throws UserError naming the line and column if the cell is empty, not a number or
     *     not finite
     */
    double number(int row, int column) {
        final String text = rows.get(row).get(column);
        final double v = EvalCommand.cell(source, line(row), header.get(column), text);
        if (!Double.isFinite(v)) {
            throw new UserError(source + ": line " + line(row) + ": column "
                + header.get(column) + " = '" + text.strip() + "': not a finite number");
        }
        return v;
    }

    /**
     * Returns a user error about one row.
     *
     * @param row the row index
     * @param what what is wrong
     * @return the error, to throw
     */
    UserError at(int row, String what) {
        return new UserError(source + ": line " + line(row) + ": " + what);
    }
}
