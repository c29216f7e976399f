package org.advecta.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code advecta run SCENARIO}: reads a scenario file, computes what it asks for and writes
 * CSV tables, plots and a text summary into the output folder.
 */
@Command(name = "run", mixinStandardHelpOptions = true,
    description = {
        "Run a scenario file (TOML): the family, [medium], [source] and what to report "
            + "([profiles], [breakthrough], [plan], [summary]).",
        "Writes into the output folder: profiles.csv, breakthrough.csv, plan.csv (for the "
            + "sections present), a plot of each (.svg or .png) and summary.txt (peak "
            + "concentrations and when they occur, arrival times of the summary level, "
            + "mass balance). Every file is written completely or not at all."},
    footer = {"", "Example:", "  advecta run scenarios/road-salt-spill.toml --out target/demo"})
final class RunCommand implements Callable<Integer> {

    private final Main.Io io;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "the scenario file (TOML)")
    private Path scenario;

    @Option(names = {"-o", "--out"}, paramLabel = "DIR", defaultValue = "advecta-output",
        description = "output folder, created if needed (default: ${DEFAULT-VALUE})")
    private Path out;

    @Option(names = "--plots", paramLabel = "FORMAT", defaultValue = "svg",
        description = "plot format: svg or png (default: ${DEFAULT-VALUE})")
    private String plots;

    @Option(names = {"-q", "--quiet"},
        description = "no summary on standard output, no progress on standard error")
    private boolean quiet;

    /**
     * Creates the command.
     *
     * @param io the streams to use
     */
    RunCommand(Main.Io io) {
        this.io = io;
    }

    @Override
    public Integer call() {
        final Plots.Format format = Plots.Format.parse(plots);
        final Scenario s = Scenario.read(scenario);
        final Runner runner = new Runner(s, quiet ? null : io.err());
        try {
            runner.compute();
        } catch (IllegalArgumentException e) {
            // What the scenario's checks leave to the library: e.g. a grid point on a
            // continuous source. Computed before the folder is made, so a failed run leaves
            // nothing behind.
            throw new UserError(scenario + ": " + e.getMessage(), e);
        }
        try {
            Files.createDirectories(out);
        } catch (IOException e) {
            throw new UserError("cannot create folder " + out + ": " + Main.reason(e), e);
        }
        final List<Path> written = runner.write(out, format);
        if (!quiet) {
            io.out().print(runner.summary());
            io.out().println();
            io.out().println("Wrote:");
            for (Path p : written) {
                io.out().println("  " + p);
            }
        }
        return 0;
    }
}
