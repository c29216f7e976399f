package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.advecta.plume.LineSource2D;
import org.advecta.plume.PointSource3D;
import org.advecta.plume.Wall;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The continuous-source families on the command line beyond {@link EvalCommandTest}'s
 * bit-for-bit cases: bad input, the {@code --error} column, the steady state's optional t
 * column, {@code list}, and {@code run} (the salt-store demo, a steady plan view, scenarios a
 * steady state cannot have).
 */
class PlumeCliTest {

    private static final String POINT = "point-source-3d v=1 D=0.1 DT=0.01 DV=0.01";
    private static final String LINE = "line-source-2d v=1 D=0.1 DT=0.01";
    private static final String PATCH =
        "patch-source-3d v=1 D=0.1 DT=0.01 DV=0.01 y1=-1 y2=1 z1=-1 z2=0";
    private static final Path LEAK = Path.of("scenarios/salt-store-leak.toml");

    private static String[] args(String command, String line, String... more) {
        final List<String> a = new ArrayList<>();
        a.add(command);
        a.addAll(List.of(line.split(" ")));
        a.addAll(List.of(more));
        return a.toArray(String[]::new);
    }

    /** Each row: the arguments after 'eval', the points, the words the one-line error has. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        POINT + " --gradient | x,y,z,t;1,0,0,1 | values only, --gradient",
        POINT + " --flux | x,y,z,t;1,0,0,1 | values only, --flux",
        POINT + " --error | x,y,z,t;1,0,0,1 | --error, point-source-3d, closed form",
        LINE + " steady=true --error | x,y;1,0 | --error, steady = true, closed form",
        LINE + " steady=maybe | x,y;1,0 | steady = 'maybe', must be one of false, true",
        LINE + " wall=reflecting | x,y,t;1,0,1 | wall = reflecting needs its position, yw",
        LINE + " yw=2 | x,y,t;1,0,1 | parameter yw places a wall, wall is none",
        LINE + " wall=absorbing zw=1 | x,y,t;1,0,1 | has no parameter 'zw'",
        LINE + " wall=absorbing yw=0 | x,y,t;1,0,1 | line-source-2d, absorbing wall at y = 0.0",
        POINT + " wall=absorbing yw=1 zw=1 | x,y,z,t;1,0,0,1 | give yw or zw, not both",
        POINT + " wall=wet yw=1 | x,y,z,t;1,0,0,1 | wall = 'wet', none, reflecting, absorbing",
        POINT + " q=nan | x,y,z,t;1,0,0,1 | parameter q = 'nan': not a number",
        POINT + " q=1e999 | x,y,z,t;1,0,0,1 | parameter q = Infinity: must be finite",
        "point-source-3d v=1 D=0 DT=0.01 DV=0.01 | x,y,z,t;1,0,0,1 | parameter D = 0: must be finite, > 0",
        "line-source-2d v=0 D=0.1 DT=0.01 steady=true | x,y;1,0 | steady = true needs flow or decay",
        "patch-source-3d v=0 D=0.1 DT=0.01 DV=0.01 y1=-1 y2=1 z1=-1 z2=0 steady=true "
            + "| x,y,z;1,0,0 | steady = true needs flow or decay",
        "patch-source-3d v=1 D=0.1 DT=0.01 DV=0.01 y1=1 y2=1 z1=-1 z2=0 | x,y,z,t;1,0,0,1 "
            + "| y2 = 1.0: must be greater than y1 = 1.0",
        "patch-source-3d v=1 D=0.1 DT=0.01 DV=0.01 y2=1 z1=-1 z2=0 | x,y,z,t;1,0,0,1 "
            + "| needs parameter y1",
        PATCH + " wall=absorbing zw=-0.5 | x,y,z,t;1,0,0,1 | must lie on one side, z = -0.5",
        POINT + " | x,y,z,t;0,0,0,1 | line 2, the source point itself",
        LINE + " | x,y,t;1,0,1;0,0,1 | line 3, on the source line itself",
        LINE + " steady=true | x,y;0,0 | line 2, on the source line itself",
        LINE + " wall=reflecting yw=2 | x,y,t;1,0,1;1,3,1 | line 3, y = 3.0, side of the wall",
        LINE + " | x,y,t;1,0,-1 | line 2, t = -1.0, >= 0",
        LINE + " | x,y;1,0 | no column t, x, y, t",
        LINE + " steady=true | x,y,z;1,0,0 | column z is not a coordinate",
        PATCH + " | x,y,z,t;1,0,0,inf | line 2, column t = 'inf': not a number"})
    void badInputIsOneLineWithStatus2(String arguments, String points, String words) {
        Cli.runWithInput(points.replace(';', '\n') + "\n", args("eval", arguments.strip()))
            .userError(words.split(", "));
    }

    @Test
    void errorColumnIsTheBoundOfTheSameValue() {
        final String points = "x,y,z,t\n0.5,0.2,-0.3,2\n3,0,-0.5,10\n-1,0.5,0,0.5\n0,0,-0.5,1\n"
            + "20,3,-1,1e4\n";
        final String[] plain = args("eval", PATCH);
        final String without = Cli.runWithInput(points, plain).ok();
        final String with = Cli.runWithInput(points, args("eval", PATCH, "--error")).ok();
        final String[] a = without.split("\n");
        final String[] b = with.split("\n");
        assertEquals("x,y,z,t,c", a[0]);
        assertEquals("x,y,z,t,c,c_error", b[0]);
        assertEquals(6, b.length);
        for (int i = 1; i < b.length; i++) {
            // the same c with and without --error, then a bound: finite, >= 0 and, for a single
            // source, within the library's documented 1e-10 of |c|
            assertEquals(a[i], b[i].substring(0, b[i].lastIndexOf(',')));
            final String[] cells = b[i].split(",");
            final double c = Double.parseDouble(cells[4]);
            final double err = Double.parseDouble(cells[5]);
            assertTrue(c > 0 && err >= 0 && err <= 1e-10 * c, b[i]);
        }
    }

    @Test
    void steadyStateReadsNoTimeAndPassesATColumnThrough() {
        final String[] steady = args("eval", LINE, "steady=true", "mu=0.01");
        final String without = Cli.runWithInput("x,y\n2,0.1\n-1,0.3\n", steady).ok();
        final String with = Cli.runWithInput("t,x,y\nlater,2,0.1\nsoon,-1,0.3\n", steady).ok();
        final LineSource2D s = LineSource2D.of(TransportParameters.of(1, 0.1).withDecay(0.01)
            .withDispersion(0.1, 0.01, 0.01), 0, 0, 1);
        final String c1 = Double.toString(s.steadyValue(2, 0.1));
        final String c2 = Double.toString(s.steadyValue(-1, 0.3));
        assertEquals("x,y,c\n2,0.1," + c1 + "\n-1,0.3," + c2 + "\n", without);
        assertEquals("t,x,y,c\nlater,2,0.1," + c1 + "\nsoon,-1,0.3," + c2 + "\n", with);
    }

    @Test
    void listShowsTheSourcesKeysAndTheirWalls() {
        final String all = Cli.run("list").ok();
        for (String name : List.of("point-source-3d", "line-source-2d", "patch-source-3d")) {
            assertTrue(all.contains(name + "  ("), name);
        }
        final String line = Cli.run("list", "line-source-2d").ok();
        assertTrue(line.startsWith("line-source-2d  (2D, plane; points: x, y, t)\n"), line);
        for (String key : List.of("  q ", "  steady ", "  wall ", "  yw ")) {
            assertTrue(line.contains(key), key);
        }
        assertFalse(line.contains("  zw "), line);
        assertTrue(line.contains("none | reflecting | absorbing"), line);
        final String patch = Cli.run("list", "patch-source-3d").ok();
        assertTrue(patch.contains("  y1      required"), patch);
        assertTrue(patch.contains("  zw "), patch);
    }

    private static Set<String> names(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).collect(Collectors.toSet());
        }
    }

    private static List<String[]> rows(Path csv) throws IOException {
        final List<String[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(csv, StandardCharsets.UTF_8)) {
            rows.add(line.split(",", -1));
        }
        return rows;
    }

    private static void assertSvg(Path file) throws Exception {
        final DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        assertEquals("svg", f.newDocumentBuilder().parse(file.toFile()).getDocumentElement()
            .getLocalName(), file.toString());
    }

    /**
     * The demo: the tables are the library's LineSource2D values bit for bit, the summary
     * reports no mass balance and no peaks but the approach to the (closed-form) steady state,
     * and each arrival time brackets the level on the library's own curve.
     */
    @Test
    void leakDemoIsTheLibrarysLineSourceWithAnHonestSummary(@TempDir Path dir) throws Exception {
        final Path out = dir.resolve("leak");
        final String stdout = Cli.run("run", LEAK.toString(), "--out", out.toString()).ok();
        assertEquals(Set.of("profiles.csv", "profiles.svg", "breakthrough.csv",
            "breakthrough.svg", "plan.csv", "plan.svg", "summary.txt"), names(out));
        for (String svg : List.of("profiles.svg", "breakthrough.svg", "plan.svg")) {
            assertSvg(out.resolve(svg));
        }
        final LineSource2D leak = LineSource2D.of(TransportParameters.of(0.25, 0.5)
            .withDispersion(0.5, 0.05, 0.05), 0, 0, 1333);
        int compared = 0;
        for (String table : List.of("profiles.csv", "plan.csv")) {
            final List<String[]> rows = rows(out.resolve(table));
            assertEquals(List.of("x", "y", "t", "c"), List.of(rows.get(0)));
            for (String[] r : rows.subList(1, rows.size())) {
                final double c = leak.value(Double.parseDouble(r[0]), Double.parseDouble(r[1]),
                    Double.parseDouble(r[2]));
                assertEquals(Double.toString(c), r[3], String.join(",", r));
                compared++;
            }
        }
        final List<String[]> curves = rows(out.resolve("breakthrough.csv"));
        assertEquals(List.of("point", "x", "y", "t", "c"), List.of(curves.get(0)));
        for (String[] r : curves.subList(1, curves.size())) {
            final double c = leak.value(Double.parseDouble(r[1]), Double.parseDouble(r[2]),
                Double.parseDouble(r[3]));
            assertEquals(Double.toString(c), r[4], String.join(",", r));
            compared++;
        }
        assertEquals(3 * 221 + 141 * 51 + 3 * 201, compared);

        final String summary = Files.readString(out.resolve("summary.txt"));
        assertTrue(stdout.startsWith(summary), stdout);
        assertFalse(summary.contains("mass balance: integral"), summary);
        assertFalse(summary.contains("peak"), summary);
        assertEquals(2, count(summary, "(no mass balance: a continuous source"), summary);
        assertEquals(3, count(summary, "steady state c = "), summary);
        final double[][] wells = {{25, 0}, {50, 4}, {120, 0}};
        final Matcher steady = Pattern.compile("steady state c = ([0-9.e+-]+) mg/L")
            .matcher(summary);
        final Matcher arrival = Pattern.compile("reaches 250 mg/L: t = ([0-9.e+-]+) d")
            .matcher(summary);
        for (double[] w : wells) {
            assertTrue(steady.find());
            final double cs = leak.steadyValue(w[0], w[1]);
            assertEquals(Runner.num(cs), steady.group(1));
            assertTrue(arrival.find(), summary);
            final double t = Double.parseDouble(arrival.group(1));
            // six printed digits: the level lies between c just before and just after
            assertTrue(leak.value(w[0], w[1], t * (1 + 1e-5)) >= 250, summary);
            assertTrue(leak.value(w[0], w[1], t * (1 - 1e-5)) < 250, summary);
        }
    }

    private static int count(String text, String part) {
        int n = 0;
        for (int i = text.indexOf(part); i >= 0; i = text.indexOf(part, i + 1)) {
            n++;
        }
        return n;
    }

    private static final String STEADY_POINT = String.join("\n",
        "family = \"point-source-3d\"",
        "[medium]",
        "v = 0.5",
        "D = 0.5",
        "DT = 0.05",
        "DV = 0.01",
        "mu = 0.001",
        "[source]",
        "z0 = -1.0",
        "q = 2.0",
        "steady = true",
        "wall = \"reflecting\"",
        "zw = 0.0",
        "[profiles]",
        "x = { from = -5.25, to = 50.25, points = 112 }",
        "y = 0.0",
        "z = -1.0",
        "[plan]",
        "x = { from = -5.25, to = 50.25, points = 112 }",
        "y = { from = -5.5, to = 5.5, points = 23 }",
        "z = -1.0",
        "");

    /** A steady plan view and profile in 3D: no t column, the library's steadyValue. */
    @Test
    void steadyPlanViewOfAPointSourceBelowAWaterTable(@TempDir Path dir) throws Exception {
        final Path file = dir.resolve("steady.toml");
        Files.writeString(file, STEADY_POINT, StandardCharsets.UTF_8);
        final Path out = dir.resolve("out");
        final String stdout = Cli.run("run", file.toString(), "--out", out.toString(), "-q")
            .ok();
        assertEquals("", stdout);
        final PointSource3D s = PointSource3D.of(TransportParameters.of(0.5, 0.5)
            .withDecay(0.001).withDispersion(0.5, 0.05, 0.01), 0, 0, -1, 2)
            .withWall(Wall.reflecting(Wall.Axis.Z, 0));
        for (String table : List.of("profiles.csv", "plan.csv")) {
            final List<String[]> rows = rows(out.resolve(table));
            assertEquals(List.of("x", "y", "z", "c"), List.of(rows.get(0)), table);
            for (String[] r : rows.subList(1, rows.size())) {
                assertEquals(Double.toString(s.steadyValue(Double.parseDouble(r[0]),
                    Double.parseDouble(r[1]), Double.parseDouble(r[2]))), r[3]);
            }
        }
        final String summary = Files.readString(out.resolve("summary.txt"));
        assertTrue(summary.contains("Plan view at steady state, z = -1,"), summary);
        assertTrue(summary.contains("  steady state: max c = "), summary);
        assertEquals(2, count(summary, "(no mass balance: a continuous source"), summary);
        assertFalse(summary.contains("at t = "), summary);
        assertFalse(summary.contains("Infinity"), summary);
    }

    private static void assertRejected(Path dir, String scenario, String... words)
            throws IOException {
        final Path file = dir.resolve("bad.toml");
        Files.writeString(file, scenario, StandardCharsets.UTF_8);
        final Path out = dir.resolve("out");
        final String line = Cli.run("run", file.toString(), "--out", out.toString())
            .userError(words);
        assertTrue(line.contains("bad.toml"), line);
        assertFalse(Files.exists(out), "an output folder was created for a bad scenario");
    }

    @Test
    void scenariosASteadyStateCannotHave(@TempDir Path dir) throws IOException {
        assertRejected(dir, STEADY_POINT.replace("[profiles]\n", "[profiles]\ntimes = [1.0]\n"),
            "profiles.times", "steady = true", "leave times out");
        assertRejected(dir, STEADY_POINT.replace("[plan]\n", "[plan]\ntime = 5.0\n"),
            "plan.time", "has no time");
        assertRejected(dir, STEADY_POINT + "[breakthrough]\nt = { from = 0.0, to = 1.0, "
            + "points = 2 }\n[[breakthrough.at]]\nx = 1.0\ny = 0.0\nz = -1.0\n",
            "breakthrough", "no breakthrough curves for a steady state");
        assertRejected(dir, STEADY_POINT.replace("steady = true", "steady = 1.0"),
            "parameter steady", "must be one of false, true");
        assertRejected(dir, STEADY_POINT.replace("zw = 0.0", "zw = -1.0"),
            "must lie on one side", "z = -1.0");
        // a plan view on the wrong side of the wall: found while computing, still no folder
        assertRejected(dir, STEADY_POINT.replace("y = { from = -5.5, to = 5.5, points = 23 }\n"
            + "z = -1.0", "y = { from = -5.5, to = 5.5, points = 23 }\nz = 1.0"),
            "z = 1.0", "side of the wall");
        // a grid through the source point itself
        assertRejected(dir, STEADY_POINT.replace("x = { from = -5.25, to = 50.25, points = 112 }\n"
            + "y = { from", "x = { from = -5.0, to = 50.0, points = 111 }\ny = { from")
            .replace("y = { from = -5.5, to = 5.5, points = 23 }",
                "y = { from = -5.0, to = 5.0, points = 21 }"),
            "the source point itself");
    }

    /** A transient point source in a scenario, bit for bit, with t in the tables. */
    @Test
    void transientPointSourceScenario(@TempDir Path dir) throws IOException {
        final String transientPoint = STEADY_POINT.replace("steady = true\n", "")
            .replace("[profiles]\n", "[profiles]\ntimes = [10.0, 40.0]\n")
            .replace("[plan]\n", "[plan]\ntime = 40.0\n");
        final Path file = dir.resolve("point.toml");
        Files.writeString(file, transientPoint, StandardCharsets.UTF_8);
        final Path out = dir.resolve("out");
        Cli.run("run", file.toString(), "--out", out.toString(), "-q").ok();
        final PointSource3D s = PointSource3D.of(TransportParameters.of(0.5, 0.5)
            .withDecay(0.001).withDispersion(0.5, 0.05, 0.01), 0, 0, -1, 2)
            .withWall(Wall.reflecting(Wall.Axis.Z, 0));
        final List<String[]> rows = rows(out.resolve("profiles.csv"));
        assertEquals(List.of("x", "y", "z", "t", "c"), List.of(rows.get(0)));
        assertEquals(1 + 2 * 112, rows.size());
        for (String[] r : rows.subList(1, rows.size())) {
            assertEquals(Double.toString(s.value(Double.parseDouble(r[0]),
                Double.parseDouble(r[1]), Double.parseDouble(r[2]), Double.parseDouble(r[3]))),
                r[4]);
        }
        final String summary = Files.readString(out.resolve("summary.txt"));
        assertTrue(summary.contains("Plan view at t = 40 T, z = -1,"), summary);
        assertEquals(2, count(summary, "(no mass balance: a continuous source"), summary);
    }

    /** The printed value in the row of a norm (column 1: absolute). */
    private static double printedNorm(String out, String norm) {
        for (String line : out.split("\n")) {
            final String[] f = line.trim().split("\\s+");
            if (f[0].equals(norm)) {
                return Double.parseDouble(f[1]);
            }
        }
        throw new AssertionError(norm + " missing from " + out);
    }

    /**
     * check compares with the same values: zero norms for the library's values; at steady
     * state without a t column (as eval), transient with one; and an error of 1e-3 in one
     * value shows as L-infinity = 1e-3.
     */
    @Test
    void checkAgainstASteadyAndATransientLineSource(@TempDir Path dir) throws IOException {
        final LineSource2D s = LineSource2D.of(TransportParameters.of(1, 0.1)
            .withDispersion(0.1, 0.01, 0.01), 0, 0, 1);
        final StringBuilder steady = new StringBuilder("x,y,c\n");
        final StringBuilder transientRows = new StringBuilder("x,y,t,c\n");
        for (int i = 1; i <= 10; i++) {
            for (int j = -2; j <= 2; j++) {
                final double x = 0.5 * i;
                final double y = 0.1 * j;
                final double cs = s.steadyValue(x, y) + (i == 3 && j == 0 ? 1e-3 : 0.0);
                steady.append(x).append(',').append(y).append(',').append(cs).append('\n');
                transientRows.append(x).append(',').append(y).append(",2,")
                    .append(s.value(x, y, 2)).append('\n');
            }
        }
        final Path a = dir.resolve("steady.csv");
        final Path b = dir.resolve("transient.csv");
        Files.writeString(a, steady.toString(), StandardCharsets.UTF_8);
        Files.writeString(b, transientRows.toString(), StandardCharsets.UTF_8);
        final String out = Cli.run(args("check", a + " " + LINE, "steady=true")).ok();
        assertEquals(1e-3, printedNorm(out, "Linf"), 1e-15, out);
        final String out2 = Cli.run(args("check", b + " " + LINE)).ok();
        for (String norm : List.of("L1", "L2", "Linf")) {
            assertEquals(0.0, printedNorm(out2, norm), out2);
        }
        // the transient family needs t
        Cli.run(args("check", a + " " + LINE)).userError("t");
    }
}
