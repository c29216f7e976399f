package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Bad input to {@code fit} and {@code check}: exactly one line on standard error naming what is
 * wrong, exit status 2, no stack trace, nothing on standard output, and no output file or
 * folder left behind.
 */
class FitCheckBadInputTest {

    @TempDir
    Path dir;
    private Path good;
    private Path out;

    @BeforeEach
    void goodData() throws IOException {
        final Solution1D s = ThirdTypeInlet.of(TransportParameters.of(0.6, 0.015),
            InletInput.pulse(1.0, 0.5));
        final StringBuilder b = new StringBuilder("x,t,c\n");
        for (int i = 1; i <= 30; i++) {
            b.append("1.0,").append(0.1 * i).append(',').append(s.value(1.0, 0.1 * i))
                .append('\n');
        }
        good = dir.resolve("good.csv");
        Files.writeString(good, b.toString(), StandardCharsets.UTF_8);
        out = dir.resolve("out");
    }

    private Path data(String text) throws IOException {
        final Path p = dir.resolve("data.csv");
        Files.writeString(p, text.replace("\\n", "\n"), StandardCharsets.UTF_8);
        return p;
    }

    private static String[] concat(String[] a, String... b) {
        return Stream.concat(Stream.of(a), Stream.of(b)).toArray(String[]::new);
    }

    /** A fit with the given arguments after DATA; asserts the error and no output folder. */
    private void fitFails(Path file, String[] rest, String... fragments) {
        Cli.run(concat(new String[] {"fit", file.toString()}, concat(rest, "-o",
            out.toString()))).userError(fragments);
        assertFalse(Files.exists(out), "output folder created");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "plume                                    | unknown family 'plume'",
        "release-2d v=1 D=1 DT=1                  | family release-2d cannot be fitted",
        "inlet-third x0=1                         | family inlet-third has no parameter 'x0'",
        "inlet-third D=                           | parameter D: missing value",
        "inlet-third D=abc                        | parameter D = 'abc': not a number",
        "inlet-third R=0.5                        | parameter R = 0.5: must be finite, >= 1",
        "inlet-third mu=-1                        | parameter mu = -1: must be finite, >= 0",
        "inlet-third v=-1                         | parameter v = -1: must be finite, > 0",
        "inlet-third --free v,x0                  | --free: 'x0' cannot be fitted",
        "inlet-third --free v,,D                  | --free v,,D: empty name",
        "inlet-third --free v,v                   | --free: v given twice",
        "inlet-third --free v,D,R R=1             | parameter R = 1: the starting value of a "
            + "free R must be > 1",
        "inlet-third input=pulse                  | input = pulse needs parameter t0",
        "inlet-third Ci=0.5                       | fit supports Ci = 0 only",
        "inlet-third --observe effluent           | --observe effluent: must be resident or "
            + "flux-averaged",
        "inlet-third --plots gif                  | --plots gif: must be svg or png",
        "slug a=1 b=0                             | family slug: b = 0.0",
        "gaussian                                 | family gaussian needs parameter s0",
        "inlet-third --free D v=1 D=1 t0=1        | parameter t0 applies only to input = "
            + "pulse"})
    void badCommandLine(String args, String message) {
        fitFails(good, args.trim().split("\\s+"), message);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "x,t,c\\n1,1,0.5\\n1,2\\n                | data.csv: line 3: expected 3 fields, found 2",
        "x,t,c\\n# note\\n\\n1,1,abc\\n          | data.csv: line 4: column c = 'abc': not a "
            + "number",
        "x,t,c\\n1,1,0.1\\n1,2,0.2\\n1,3,NaN\\n  | data.csv: line 4: column c = 'NaN': not a "
            + "number",
        "x,t,c\\n1,1,0.1\\n1,2,1e999\\n          | data.csv: line 3: column c = '1e999': not "
            + "a finite number",
        "x,t,c\\n1,1,0.1\\n1,-2,0.2\\n1,3,0.1\\n | data.csv: line 3: t = -2: must be >= 0",
        "x,t,c\\n1,1,0.1\\n-1,2,0.2\\n1,3,0.1\\n | data.csv: line 3: x = -1: outside the "
            + "half-line x >= 0 of family inlet-third",
        "x,t,c\\n1,1,0\\n1,2,0\\n1,3,0\\n        | data.csv: every c is 0",
        "x,t,c\\n1,1,0.1\\n1,2,0.2\\n            | data.csv: 2 data rows for 2 free "
            + "parameters (v, D); a fit needs more rows",
        "x,t,c\\n                                | data.csv: no data rows",
        "x,t\\n1,1\\n                            | data.csv: no column c (needed: x, t, c)",
        "x,y,t,c\\n1,0,1,1\\n                    | data.csv: column y: not a coordinate",
        "x,t,c,fitted\\n1,1,1,1\\n               | data.csv: column fitted: clashes",
        "x,t,c,w\\n1,1,1,1\\n1,2,1,0\\n1,3,1,1\\n | data.csv: line 3: w = 0: a weight must be > 0",
        "x,t,c\\n1,1,1\\n1,2,\"1\"x\\n           | data.csv: malformed CSV",
        "''                                      | data.csv: no header line"})
    void badData(String text, String message) throws IOException {
        fitFails(data(text.equals("''") ? "" : text),
            new String[] {"inlet-third", "input=pulse", "t0=0.5"}, message);
    }

    @Test
    void oneAllZeroCurveAmongOthers() throws IOException {
        fitFails(data("x,t,c\n1,1,0.1\n1,2,0.3\n1,3,0.2\n9,1,0\n9,2,0\n9,3,0\n"),
            new String[] {"inlet-first"}, "data.csv: the breakthrough curve at x = 9 (3 rows "
                + "from line 5) has c = 0 at every point");
    }

    @Test
    void missingDataFile() {
        fitFails(dir.resolve("none.csv"), new String[] {"inlet-first"}, "cannot read",
            "none.csv", "no such file");
    }

    @Test
    void outputFolderThatIsAFile() throws IOException {
        Files.writeString(out, "x", StandardCharsets.UTF_8);
        Cli.run("fit", good.toString(), "inlet-third", "input=pulse", "t0=0.5", "-o",
            out.toString()).userError("cannot create folder", "a file of that name is in the way");
        assertEquals("x", Files.readString(out, StandardCharsets.UTF_8));
    }

    // ---- check ----

    private Path sim(String name, String text) throws IOException {
        final Path p = dir.resolve(name);
        Files.writeString(p, text.replace("\\n", "\n"), StandardCharsets.UTF_8);
        return p;
    }

    private void checkFails(String[] args, String... fragments) {
        final Path table = dir.resolve("errors.csv");
        Cli.run(concat(args, "-o", table.toString())).userError(fragments);
        assertFalse(Files.exists(table), "output file written");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "plume v=1                                  | unknown family 'plume'",
        "v=1 D=1                                    | missing FAMILY",
        "gaussian v=1 D=0.1 s0=0.1 x0=3             | family gaussian has no parameter 'x0'",
        "gaussian v=1 D= s0=0.1                     | parameter D: missing value",
        "gaussian v=1 D=x s0=0.1                    | parameter D = 'x': not a number",
        "gaussian v=1 D=0 s0=0.1                    | parameter D = 0: must be finite, > 0",
        "gaussian v=1 D=0.1                         | family gaussian needs parameter s0",
        "gaussian slug v=1 D=0.1 s0=0.1             | two families given: gaussian and slug",
        "release-2d v=1 D=0.1 DT=0.1 --cells        | --cells: family release-2d has no exact "
            + "cell averages",
        "gaussian v=1 D=0.1 s0=0.1 --h 0.1          | --h: mesh sizes are for an order study of "
            + "three or more files",
        "gaussian v=1 D=0.1 s0=0.1 --h 0.1,0.2      | --h 0.1,0.2: 2 mesh sizes for 1 files"})
    void badCheckCommandLine(String args, String message) throws IOException {
        final Path s = sim("sim.csv", "x,t,c\\n0,1,0.5\\n");
        final List<String> all = new ArrayList<>(List.of("check"));
        final String[] parts = args.trim().split("\\s+");
        if (!parts[0].contains("=") || parts[0].equals("v=1")) {
            all.add(s.toString());
        }
        all.addAll(List.of(parts));
        checkFails(all.toArray(new String[0]), message);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "x,t,c\\n0,1,0.5\\n0.5,1\\n               | sim.csv: line 3: expected 3 fields, found 2",
        "x,t,c\\n0,1,0.5\\n0.5,1,zz\\n            | sim.csv: line 3: column c = 'zz': not a "
            + "number",
        "x,t,c\\n0,1,0.5\\n0.5,-1,0.2\\n          | sim.csv: line 3: t = -1: must be >= 0",
        "x,t,c\\n0,1,0.5\\n-0.5,1,0.2\\n          | sim.csv: line 3: x = -0.5: outside the "
            + "half-line",
        "x,t\\n0,1\\n                             | sim.csv: no column c (needed: x, t, c)",
        "x,y,t,c\\n0,0,1,1\\n                     | sim.csv: column y is not a coordinate of a "
            + "1D family",
        "x,t,c,exact\\n0,1,1,1\\n                 | sim.csv: column exact: clashes",
        "x,t,c,w,cell-width\\n0,1,1,1,1\\n        | sim.csv: columns w and cell-width",
        "x,t,c,w\\n0,1,1,1\\n0,2,1,-1\\n          | sim.csv: line 3: w = -1: a weight must be > 0",
        "x,t,c\\n                                 | sim.csv: no data rows"})
    void badSimulationFile(String text, String message) throws IOException {
        final Path s = sim("sim.csv", text);
        checkFails(new String[] {"check", s.toString(), "inlet-first", "v=1", "D=0.1"},
            message);
    }

    @Test
    void badCellsAndRefinement() throws IOException {
        final Path cells = sim("cells.csv", "x_left,x_right,t,c\n0,0.1,1,1\n0.2,0.1,1,1\n");
        checkFails(new String[] {"check", cells.toString(), "step", "v=1", "D=0.1", "--cells"},
            "cells.csv: line 3: x_right = 0.1: must be > x_left = 0.2");
        final Path points = sim("a.csv", "x,t,c\n0,1,1\n1,1,1\n");
        final Path b = sim("b.csv", "x,t,c\n0,1,1\n0.5,1,1\n1,1,1\n");
        final Path c = sim("c.csv", "x,t,c\n0,1,1\n0.25,1,1\n0.5,1,1\n0.75,1,1\n1,1,1\n");
        final Path one = sim("one.csv", "x,t,c\n0.5,1,1\n0.5,2,1\n");
        final String[] family = {"background", "v=1", "D=0.1"};
        checkFails(concat(new String[] {"check", points.toString(), b.toString()}, family),
            "an observed order needs at least three files (got 2");
        checkFails(concat(new String[] {"check", points.toString()}, concat(family, "--refine",
            b.toString(), c.toString(), "--h", "1,2")), "--h 1,2: 2 mesh sizes for 3 files");
        checkFails(concat(new String[] {"check", points.toString()}, concat(family, "--refine",
            b.toString(), c.toString(), "--h", "1,x,3")), "--h: 'x' is not a number");
        checkFails(concat(new String[] {"check", points.toString()}, concat(family, "--refine",
            b.toString(), c.toString(), "--h", "1,0,3")), "--h: h = 0: must be finite and > 0");
        checkFails(concat(new String[] {"check", points.toString()}, concat(family, "--refine",
            b.toString(), c.toString(), "--h", "1,1,3")), "a.csv and ",
            "b.csv have the same mesh size h = 1.0");
        checkFails(concat(new String[] {"check", points.toString()}, concat(family, "--refine",
            b.toString(), one.toString())), "one.csv: cannot infer a mesh size");
        checkFails(concat(new String[] {"check", dir.resolve("none.csv").toString()}, family),
            "cannot read", "none.csv");
    }

    @Test
    void aFailureLateInTheFileKeepsAnOlderOutputFile() throws IOException {
        final StringBuilder b = new StringBuilder("x,t,c\n");
        for (int i = 0; i < 5000; i++) {
            b.append(0.001 * i).append(",1,0.5\n");
        }
        b.append("0.5,1,oops\n");
        final Path s = sim("big.csv", b.toString());
        final Path table = dir.resolve("errors.csv");
        Files.writeString(table, "older", StandardCharsets.UTF_8);
        Cli.run("check", s.toString(), "inlet-first", "v=1", "D=0.1", "-o", table.toString())
            .userError("big.csv: line 5002: column c = 'oops': not a number");
        assertEquals("older", Files.readString(table, StandardCharsets.UTF_8));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(0, files.filter(p -> p.getFileName().toString().endsWith(".part"))
                .count());
        }
    }
}
