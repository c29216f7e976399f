package org.advecta.cli;

import java.io.PrintStream;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code advecta list [FAMILY]}: the families, their parameters, defaults and ranges. */
@Command(name = "list", mixinStandardHelpOptions = true,
    description = {"List every solution family with its parameters: meaning (L length, "
        + "T time, C concentration, in any consistent units), default and valid range."})
final class ListCommand implements Callable<Integer> {

    private final Main.Io io;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FAMILY",
        description = "show only this family")
    private String only;

    /**
     * Creates the command.
     *
     * @param io the streams to use
     */
    ListCommand(Main.Io io) {
        this.io = io;
    }

    @Override
    public Integer call() {
        if (only != null) {
            print(io.out(), Families.find(only));
            return 0;
        }
        boolean first = true;
        for (Family f : Families.ALL) {
            if (!first) {
                io.out().println();
            }
            first = false;
            print(io.out(), f);
        }
        return 0;
    }

    private static void print(PrintStream out, Family f) {
        out.printf(Locale.ROOT, "%s  (%dD, %s; points: %s)%n", f.name(), f.dimensions(),
            f.domain(), String.join(", ", f.coordinates()));
        out.printf(Locale.ROOT, "  %s%n", f.summary());
        int keyWidth = 3;
        int defaultWidth = 7;
        int rangeWidth = 20;
        for (ParamSpec p : f.params()) {
            keyWidth = Math.max(keyWidth, p.key().length());
            defaultWidth = Math.max(defaultWidth, p.defaultText().length());
            rangeWidth = Math.max(rangeWidth, p.rangeText().length());
        }
        final String row = "  %-" + keyWidth + "s  %-" + defaultWidth + "s  %-" + rangeWidth
            + "s  %s%n";
        out.printf(Locale.ROOT, row, "key", "default", "range", "meaning");
        for (ParamSpec p : f.params()) {
            out.printf(Locale.ROOT, row, p.key(), p.defaultText(), p.rangeText(), p.meaning());
        }
    }
}
