package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every kind of bad input ends with one line on standard error naming what is wrong, exit
 * status 2, no stack trace, and no output file that looks complete.
 */
class BadInputTest {

    private static final String[] SLUG = {"eval", "slug", "v=1", "D=0.1", "a=0", "b=1"};

    private static String[] with(String[] base, String... more) {
        return Stream.concat(Stream.of(base), Stream.of(more)).toArray(String[]::new);
    }

    @Test
    void unknownFamily() {
        Cli.run("eval", "plume", "v=1", "D=1").userError("unknown family 'plume'", "slug");
        Cli.run("list", "plume").userError("unknown family 'plume'");
    }

    @Test
    void unknownKey() {
        Cli.runWithInput("x,t\n1,1\n", with(SLUG, "x0=3"))
            .userError("family slug has no parameter 'x0'", "a, b, C0");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "D=       | parameter D: missing value",
        "b        | expected key=value, got 'b'",
        "=4       | expected key=value",
        "D=abc    | parameter D = 'abc': not a number",
        "D=0.1.2  | parameter D = '0.1.2': not a number",
        "D=NaN    | parameter D = 'NaN': not a number",
        "D=1e999  | parameter D = Infinity: must be finite, > 0",
        "D=-1     | parameter D = -1: must be finite, > 0",
        "R=0.5    | parameter R = 0.5: must be finite, >= 1",
        "mu=-0.1  | parameter mu = -0.1: must be finite, >= 0",
        "C0=x     | parameter C0 = 'x': not a number",
        "v=3      | parameter v given twice"})
    void missingNonNumericOrOutOfRangeValue(String arg, String message) {
        final String[] args = arg.startsWith("D=") && !arg.equals("D=")
            ? new String[] {"eval", "slug", "v=1", arg, "a=0", "b=1"}
            : arg.equals("D=") ? new String[] {"eval", "slug", "v=1", "D=", "a=0", "b=1"}
            : with(SLUG, arg);
        Cli.runWithInput("x,t\n1,1\n", args).userError(message);
    }

    @Test
    void missingRequiredParameterOrBadCombination() {
        Cli.run("eval", "slug", "v=1", "D=0.1", "a=0").userError("family slug needs parameter b");
        Cli.run("eval", "slug", "v=1", "D=0.1", "a=2", "b=1").userError("family slug: b = 1.0");
        Cli.run("eval", "inlet-third", "v=-1", "D=0.1").userError("parameter v = -1");
        Cli.run("eval", "inlet-first", "v=1", "D=0.1", "input=pulse")
            .userError("input = pulse needs parameter t0");
        Cli.run("eval", "inlet-first", "v=1", "D=0.1", "lambda=0.1")
            .userError("parameter lambda applies only to input = exponential");
        Cli.run("eval", "inlet-first", "v=1", "D=0.1", "input=square")
            .userError("parameter input = 'square': must be one of constant, pulse, exponential");
        Cli.run("eval", "step", "v=1", "D=0.1", "side=up").userError("parameter side = 'up'");
        Cli.run("eval", "inlet-first", "v=1", "D=0.1", "input=exponential", "lambda=5")
            .userError("family inlet-first: lambda = 5.0");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "x,t\\n1,2\\n3\\n                  | standard input: line 3: expected 2 fields, found 1",
        "x,t\\n1,2\\n\\n# note\\n3,4,5\\n  | standard input: line 5: expected 2 fields, found 3",
        "x,t\\n1,2\\n3,abc\\n              | standard input: line 3: column t = 'abc': not a number",
        "x,t\\n1,2\\n,2\\n                 | standard input: line 3: column x: missing value",
        "x,t\\n1,2\\n1,-2\\n               | standard input: line 3: t = -2.0",
        "x,t\\n1,2\\n\"1\"x,2\\n           | standard input: malformed CSV",
        "''                                | standard input: no header line",
        "x\\n1\\n                          | standard input: no column t",
        "x,y,t\\n1,2,3\\n                  | standard input: column y is not a coordinate",
        "x,t,x\\n1,2,3\\n                  | standard input: column x appears twice",
        "x,t,c\\n1,2,3\\n                  | standard input: the input already has a column c"})
    void malformedCsv(String text, String message) {
        final String csv = text.equals("''") ? "" : text.replace("\\n", "\n");
        Cli.runWithInput(csv, SLUG).userError(message);
    }

    @Test
    void pointOutsideTheHalfLineNamesItsLine() {
        Cli.runWithInput("x,t\n0,1\n0.5,1\n-0.5,1\n", "eval", "inlet-first", "v=1", "D=0.1")
            .userError("standard input: line 4: x = -0.5");
    }

    @Test
    void unreadableOrUnwritableFiles(@TempDir Path dir) {
        Cli.run(with(SLUG, "-i", dir.resolve("none.csv").toString()))
            .userError("cannot read", "none.csv", "no such file");
        Cli.runWithInput("x,t\n1,1\n", with(SLUG, "-o", dir.resolve("no/such/dir/c.csv")
            .toString())).userError("cannot write", "c.csv");
        Cli.run("run", dir.resolve("none.toml").toString()).userError("cannot read", "none.toml");
    }

    @Test
    void outputFolderThatIsAFile(@TempDir Path dir) throws IOException {
        final Path file = dir.resolve("taken");
        Files.writeString(file, "x", StandardCharsets.UTF_8);
        Cli.run("run", "scenarios/road-salt-spill.toml", "--out", file.toString())
            .userError("cannot create folder", "taken", "a file of that name is in the way");
        assertEquals("x", Files.readString(file, StandardCharsets.UTF_8));
    }

    @Test
    void aFailedEvalLeavesNoOutputFileAndKeepsAnOldOne(@TempDir Path dir) throws IOException {
        final StringBuilder csv = new StringBuilder("x,t\n");
        for (int i = 0; i < 5000; i++) {
            csv.append(i * 1e-3).append(",1\n");
        }
        csv.append("oops,1\n");
        final Path out = dir.resolve("c.csv");
        Cli.runWithInput(csv.toString(), with(SLUG, "-o", out.toString()))
            .userError("line 5002: column x = 'oops': not a number");
        assertEquals(List.of(), names(dir));
        Files.writeString(out, "earlier result\n", StandardCharsets.UTF_8);
        Cli.runWithInput(csv.toString(), with(SLUG, "-o", out.toString())).userError("line 5002");
        assertEquals(List.of("c.csv"), names(dir));
        assertEquals("earlier result\n", Files.readString(out, StandardCharsets.UTF_8));
    }

    @Test
    void commandLineMistakes() {
        Cli.run().userError("missing subcommand");
        Cli.run("frobnicate").userError("frobnicate");
        Cli.run("eval").userError("FAMILY");
        Cli.run("eval", "slug", "--no-such-option").userError("--no-such-option");
        Cli.run("run").userError("SCENARIO");
    }

    // ---- scenarios ----

    private static String demo() throws IOException {
        return Files.readString(Path.of("scenarios/road-salt-spill.toml"), StandardCharsets.UTF_8);
    }

    private static String changed(String text, String from, String to) {
        assertTrue(text.contains(from), () -> "the demo scenario no longer contains " + from);
        return text.replace(from, to);
    }

    private static void assertScenarioRejected(Path dir, String scenario, String... message)
            throws IOException {
        final Path file = dir.resolve("bad.toml");
        Files.writeString(file, scenario, StandardCharsets.UTF_8);
        final Path out = dir.resolve("out");
        final String line = Cli.run("run", file.toString(), "--out", out.toString())
            .userError(message);
        assertTrue(line.contains("bad.toml"), line);
        assertFalse(Files.exists(out), "an output folder was created for a bad scenario");
    }

    @Test
    void scenarioWithOutOfRangeParameters(@TempDir Path dir) throws IOException {
        final String demo = demo();
        assertScenarioRejected(dir, changed(demo, "R = 1.0 ", "R = 0.5 "),
            "parameter R = 0.5: must be finite, >= 1");
        assertScenarioRejected(dir, changed(demo, "D = 0.5 ", "D = -0.5 "), "parameter D = -0.5");
        assertScenarioRejected(dir, changed(demo, "DT = 0.05", "DT = \"wide\""),
            "parameter DT = 'wide': not a number");
        assertScenarioRejected(dir, changed(demo, "mu = 0.0 ", "mu = nan "), "parameter mu");
        assertScenarioRejected(dir, changed(demo, "times = [30.0,", "times = [-30.0,"),
            "profiles.times", "must be > 0");
        assertScenarioRejected(dir, changed(demo, "time = 240.0", "time = 0.0"), "plan.time");
        assertScenarioRejected(dir, changed(demo, "from = -30.0, to = 200.0",
            "from = 200.0, to = -30.0"), "profiles.x", "needs from < to");
        assertScenarioRejected(dir, changed(demo, "points = 461", "points = 1"),
            "profiles.x.points", "between 2 and");
        assertScenarioRejected(dir, changed(demo, "points = 461", "points = 4.5"),
            "profiles.x.points", "whole number");
        assertScenarioRejected(dir, changed(demo, "points = 141", "points = 99999"),
            "plan", "at most");
    }

    @Test
    void scenarioWithUnknownOrMisplacedKeys(@TempDir Path dir) throws IOException {
        final String demo = demo();
        assertScenarioRejected(dir, changed(demo, "family = \"release-2d\"",
            "family = \"release-4d\""), "family", "unknown family 'release-4d'");
        assertScenarioRejected(dir, changed(demo, "times = [", "tims = ["), "profiles.tims",
            "unknown key");
        assertScenarioRejected(dir, changed(demo, "x0 = 0.0 ", "z0 = 0.0 "),
            "has no parameter 'z0'");
        assertScenarioRejected(dir, changed(demo, "[source]\n", "[source]\nv = 1.0\n"),
            "source.v", "belongs in [medium]");
        assertScenarioRejected(dir, changed(demo, "[medium]\n", "[medium]\nM = 1.0\n"),
            "medium.M", "not a property of the medium");
        assertScenarioRejected(dir, changed(demo, "family = \"release-2d\"",
            "family = \"release-1d\""), "has no parameter 'DT'");
        assertScenarioRejected(dir, changed(demo, "name = \"MW1\"", "name = \"MW1\"\nz = 1.0"),
            "breakthrough.at[1].z", "no z coordinate");
        assertScenarioRejected(dir, changed(demo, "level = 250.0", "level = \"high\""),
            "summary.level", "must be a number");
    }

    @Test
    void scenarioThatIsNotToml(@TempDir Path dir) throws IOException {
        assertScenarioRejected(dir, changed(demo(), "[plan]", "[plan"), "line", "not valid TOML");
        assertScenarioRejected(dir, "title = \"nothing\"\n", "family", "missing");
        assertScenarioRejected(dir, "family = \"slug\"\n[medium]\nv = 1.0\nD = 0.1\n"
            + "[source]\na = 0.0\nb = 1.0\n", "nothing to report");
        assertScenarioRejected(dir, "family = \"slug\"\n[source]\na = 0.0\nb = 1.0\n",
            "missing table [medium]");
        assertScenarioRejected(dir, "family = \"inlet-first\"\n[medium]\nv = 1.0\nD = 0.1\n"
            + "[profiles]\ntimes = [1.0]\nx = { from = -1.0, to = 1.0, points = 11 }\n",
            "profiles.x", "outside the domain of inlet-first");
        assertScenarioRejected(dir, "family = \"slug\"\n[medium]\nv = 1.0\nD = 0.1\n"
            + "[source]\na = 0.0\nb = 1.0\n[plan]\ntime = 1.0\n", "plan",
            "needs a 2D or 3D family");
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted()
                .collect(Collectors.toList());
        }
    }
}
