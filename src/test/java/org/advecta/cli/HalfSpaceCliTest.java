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
import java.util.OptionalDouble;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.advecta.halfspace.HalfSpaceKernel2D;
import org.advecta.halfspace.HalfSpaceKernel3D;
import org.advecta.halfspace.Wall;
import org.advecta.halfspace.WallAxis;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The half-space families on the command line beyond {@link EvalCommandTest}'s cases: walls
 * along the flow (axis = y, z) bit for bit, bad input, the closed-form amounts behind run's
 * mass balance against the trapezoidal rule, and run with a wall.
 */
class HalfSpaceCliTest {

    private static String[] args(String command, String line, String... more) {
        final List<String> a = new ArrayList<>();
        a.add(command);
        a.addAll(List.of(line.split(" ")));
        a.addAll(List.of(more));
        return a.toArray(String[]::new);
    }

    /** Walls y = 0 and z = 0: points on the domain's side only, the library's values. */
    @Test
    void wallsAlongTheFlowBitForBit() {
        final TransportParameters p = TransportParameters.of(0.3, 0.2).withRetardation(1.4)
            .withDecay(0.01).withDispersion(0.2, 0.02, 0.005);
        final HalfSpaceKernel2D k2 = HalfSpaceKernel2D.of(p, Wall.ZERO_FLUX, WallAxis.Y, -0.5,
            0.3);
        final HalfSpaceKernel3D k3y = HalfSpaceKernel3D.of(p, Wall.ABSORBING, WallAxis.Y, 0.5,
            0.3, -0.2);
        final HalfSpaceKernel3D k3z = HalfSpaceKernel3D.of(p, Wall.ZERO_FLUX, WallAxis.Z, 0.5,
            -0.2, 0.3);
        final StringBuilder pts2 = new StringBuilder("x,y,t\n");
        final StringBuilder pts3 = new StringBuilder("x,y,z,t\n");
        final List<double[]> points = new ArrayList<>();
        for (double x : new double[] {-1.5, 0, 0.5, 2}) {
            for (double w : new double[] {0, 0.1, 0.3, 1.25}) {
                for (double t : new double[] {0, 0.5, 3, 20}) {
                    points.add(new double[] {x, w, t});
                    pts2.append(x).append(',').append(w).append(',').append(t).append('\n');
                    pts3.append(x).append(',').append(w).append(',').append(w).append(',')
                        .append(t).append('\n');
                }
            }
        }
        final String[] out2 = Cli.runWithInput(pts2.toString(), "eval", "release-wall-2d",
            "v=0.3", "D=0.2", "DT=0.02", "R=1.4", "mu=0.01", "wall=zero-flux", "axis=y",
            "x0=-0.5", "y0=0.3", "--gradient").ok().split("\n");
        final String[] out3y = Cli.runWithInput(pts3.toString(), "eval", "release-wall-3d",
            "v=0.3", "D=0.2", "DT=0.02", "DV=0.005", "R=1.4", "mu=0.01", "wall=absorbing",
            "axis=y", "x0=0.5", "y0=0.3", "z0=-0.2", "--flux").ok().split("\n");
        final String[] out3z = Cli.runWithInput(pts3.toString(), "eval", "release-wall-3d",
            "v=0.3", "D=0.2", "DT=0.02", "DV=0.005", "R=1.4", "mu=0.01", "wall=zero-flux",
            "axis=z", "x0=0.5", "y0=-0.2", "z0=0.3").ok().split("\n");
        assertEquals("x,y,t,c,dcdx,dcdy", out2[0]);
        assertEquals("x,y,z,t,c,jx,jy,jz", out3y[0]);
        int nonZero = 0;
        for (int i = 0; i < points.size(); i++) {
            final double x = points.get(i)[0];
            final double w = points.get(i)[1];
            final double t = points.get(i)[2];
            final String[] a = out2[i + 1].split(",");
            assertEquals(Double.toString(k2.value(x, w, t)), a[3]);
            assertEquals(Double.toString(k2.gradientX(x, w, t)), a[4]);
            assertEquals(Double.toString(k2.gradientY(x, w, t)), a[5]);
            final String[] b = out3y[i + 1].split(",");
            assertEquals(Double.toString(k3y.value(x, w, w, t)), b[4]);
            assertEquals(Double.toString(k3y.fluxX(x, w, w, t)), b[5]);
            assertEquals(Double.toString(k3y.fluxY(x, w, w, t)), b[6]);
            assertEquals(Double.toString(k3y.fluxZ(x, w, w, t)), b[7]);
            final String[] c = out3z[i + 1].split(",");
            assertEquals(Double.toString(k3z.value(x, w, w, t)), c[4]);
            if (k3z.value(x, w, w, t) > 0 && k3y.value(x, w, w, t) > 0) {
                nonZero++;
            }
        }
        assertTrue(nonZero > points.size() / 2, "too few non-zero values: " + nonZero);
    }

    /** Each row: the arguments after 'eval', the points, the words the one-line error has. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "release-wall-1d v=1 D=0.1 x0=1 | x,t;1,1 | needs parameter wall, absorbing, zero-flux",
        "release-wall-1d v=1 D=0.1 x0=1 wall=reflecting | x,t;1,1 "
            + "| wall = 'reflecting', must be one of absorbing, zero-flux",
        "release-wall-1d v=1 D=0.1 wall=absorbing | x,t;1,1 | needs parameter x0",
        "release-wall-1d v=1 D=0.1 wall=absorbing x0=0 | x,t;1,1 | x0 = 0: must be finite, > 0",
        "release-wall-1d v=1 D=0.1 wall=absorbing x0=1 | x,t;-0.5,1 | line 2, x = -0.5, >= 0",
        "release-wall-1d v=1 D=0.1 wall=absorbing x0=1 axis=x | x,t;1,1 "
            + "| has no parameter 'axis'",
        "release-wall-2d v=1 D=0.1 DT=0.01 wall=absorbing x0=1 y0=1 | x,y,t;1,1,1 "
            + "| needs parameter axis",
        "release-wall-2d v=1 D=0.1 DT=0.01 wall=absorbing axis=z x0=1 y0=1 | x,y,t;1,1,1 "
            + "| axis = 'z', must be one of x, y",
        "release-wall-2d v=1 D=0.1 DT=0.01 wall=absorbing axis=x x0=-1 y0=1 | x,y,t;1,1,1 "
            + "| release-wall-2d, x0 = -1.0, > 0",
        "release-wall-2d v=1 D=0.1 DT=0.01 wall=zero-flux axis=y x0=1 y0=0 | x,y,t;1,1,1 "
            + "| release-wall-2d, y0 = 0.0, > 0",
        "release-wall-2d v=1 D=0.1 DT=0.01 wall=zero-flux axis=y x0=1 y0=1 | x,y,t;1,1,1;1,-2,1 "
            + "| line 3, y = -2.0, >= 0",
        "release-wall-3d v=1 D=0.1 DT=0.01 DV=0.01 wall=zero-flux axis=z x0=1 y0=1 z0=1 "
            + "| x,y,z,t;1,1,-1,1 | line 2, z = -1.0, >= 0",
        "release-wall-3d v=1 D=0.1 DT=0.01 wall=zero-flux axis=z x0=1 y0=1 z0=1 "
            + "| x,y,z,t;1,1,1,1 | needs parameter DV",
        "step-wall v=1 D=0.1 wall=absorbing a=-1 | x,t;1,1 | parameter a = -1: must be finite, >= 0",
        "step-wall v=1 D=0.1 wall=absorbing | x,t;1,-1 | line 2, t = -1.0",
        "slug-wall v=1 D=0.1 wall=absorbing a=1 b=1 | x,t;1,1 | slug-wall, b = 1.0: must be > a",
        "slug-wall v=1 D=0.1 wall=absorbing | x,t;1,1 | needs parameter b",
        "slug-wall v=1 D=0 wall=absorbing b=1 | x,t;1,1 | parameter D = 0: must be finite, > 0"})
    void badInputIsOneLineWithStatus2(String arguments, String points, String words) {
        Cli.runWithInput(points.replace(';', '\n') + "\n", args("eval", arguments.strip()))
            .userError(words.split(", "));
    }

    /**
     * The amount in solution run's mass balance uses (the library's massInDomain times M, or
     * C0 (b − a) e^{−μt/R} for a slug at a zero-flux wall) against the trapezoidal rule applied
     * to the family's own c(x, t) from the wall to far past the plume: the wiring (M, the
     * wall, the decay) checked by an independent route.
     */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "release-wall-1d | v=-0.5 D=0.1 R=1.3 mu=0.02 wall=absorbing x0=1 M=3 | 1.5",
        "release-wall-1d | v=0.5 D=0.1 wall=absorbing x0=0.3 M=2               | 0.8",
        "release-wall-1d | v=-1 D=0.2 R=2 mu=0.1 wall=zero-flux x0=0.5 M=3      | 2.0",
        "slug-wall       | v=-0.3 D=0.05 mu=0.2 wall=zero-flux a=0.2 b=1 C0=2  | 1.5",
        "slug-wall       | v=0.3 D=0.05 R=1.5 wall=zero-flux b=0.5             | 1.0"})
    void closedFormAmountMatchesQuadrature(String family, String args, double t) {
        final Family f = Families.find(family);
        final Params p = Params.of(f, EvalCommand.assignments(List.of(args.split(" "))));
        final Field field = f.create(p);
        final OptionalDouble exact = field.mass(t);
        assertTrue(exact.isPresent());
        final double spread = Math.sqrt(4 * p.get("D") * t / p.get("R"));
        // 12 spreads past the drifted source: the tail beyond is below erfc(12) ~ 1e-64
        final double hi = 2 + Math.abs(p.get("v")) * t / p.get("R") + 12 * spread;
        final int n = 4_000;
        final double h = hi / n;
        double sum = 0.5 * (field.value(0, 0, 0, t) + field.value(hi, 0, 0, t));
        for (int i = 1; i < n; i++) {
            sum += field.value(i * h, 0, 0, t);
        }
        // trapezoidal rule with its Euler–Maclaurin end correction −h²/12 (c'(hi) − c'(0)),
        // so that the rule's error is O(h⁴): below 1e-9 relative here (h <= 2.5e-3); 1e-8
        // still catches any wrong factor
        final double[] g0 = new double[1];
        final double[] g1 = new double[1];
        field.gradient(0, 0, 0, t, g0);
        field.gradient(hi, 0, 0, t, g1);
        final double integral = sum * h - h * h / 12 * (g1[0] - g0[0]);
        assertEquals(exact.getAsDouble(), integral, 1e-8 * exact.getAsDouble(),
            family + " " + args);
        assertTrue(exact.getAsDouble() > 0.01 * p.get(family.startsWith("slug") ? "C0" : "M"));
    }

    @Test
    void familiesWithoutAFiniteAmountSayNothing() {
        for (String args : List.of("step-wall v=1 D=0.1 wall=absorbing",
                "step-wall v=1 D=0.1 wall=zero-flux", "slug-wall v=1 D=0.1 wall=absorbing b=1")) {
            final String[] a = args.split(" ", 2);
            final Family f = Families.find(a[0]);
            assertTrue(f.create(Params.of(f, EvalCommand.assignments(
                List.of(a[1].split(" "))))).mass(1.0).isEmpty(), args);
        }
        // no default wall: the kind must be said
        assertTrue(Families.find("release-wall-1d").params().stream()
            .anyMatch(s -> s.key().equals("wall") && s.isRequired()));
    }

    private static final String SIDE_WALL = String.join("\n",
        "family = \"release-wall-2d\"",
        "[medium]",
        "v = 0.25",
        "D = 0.5",
        "DT = 0.05",
        "[source]",
        "wall = \"zero-flux\"",
        "axis = \"y\"",
        "x0 = 0.0",
        "y0 = 2.0",
        "M = 100.0",
        "[plan]",
        "time = 40.0",
        "x = { from = -30.0, to = 60.0, points = 181 }",
        "y = { from = 0.0, to = 20.0, points = 401 }",
        "[breakthrough]",
        "t = { from = 0.0, to = 100.0, points = 101 }",
        "[[breakthrough.at]]",
        "name = \"bank\"",
        "x = 10.0",
        "y = 0.0",
        "");

    /**
     * A release beside an impermeable side wall (y = 0): the plan view's integral over the
     * half-plane window equals the amount M in solution (nothing leaves at a zero-flux wall,
     * no decay), and an absorbing wall's amount is the library's massInDomain.
     */
    @Test
    void runWithASideWallBalancesItsMass(@TempDir Path dir) throws IOException {
        final Path file = dir.resolve("wall.toml");
        Files.writeString(file, SIDE_WALL, StandardCharsets.UTF_8);
        final String summary = Cli.run("run", file.toString(), "--out",
            dir.resolve("out").toString()).ok();
        final Pattern balance = Pattern.compile("integral of c dx dy over the window = \\S+ "
            + "C L\\^2; exact over the whole domain = (\\S+) \\(relative difference (\\S+)\\)");
        Matcher m = balance.matcher(summary);
        assertTrue(m.find(), summary);
        assertEquals("100", m.group(1));
        // trapezoidal rule, h = 0.5 and 0.05 on a plume about 5 by 3 wide
        assertTrue(Math.abs(Double.parseDouble(m.group(2))) < 1e-4, m.group());
        assertTrue(summary.contains("bank at (10, 0) L:"), summary);

        final HalfSpaceKernel2D absorbing = HalfSpaceKernel2D.of(TransportParameters.of(0.25,
            0.5).withDispersion(0.5, 0.05, 0.05), Wall.ABSORBING, WallAxis.Y, 0, 2);
        Files.writeString(file, SIDE_WALL.replace("zero-flux", "absorbing"),
            StandardCharsets.UTF_8);
        final String summary2 = Cli.run("run", file.toString(), "--out",
            dir.resolve("out2").toString()).ok();
        m = balance.matcher(summary2);
        assertTrue(m.find(), summary2);
        assertEquals(Runner.num(100 * absorbing.massInDomain(40)), m.group(1));
        assertTrue(Math.abs(Double.parseDouble(m.group(2))) < 1e-4, m.group());
        assertTrue(100 * absorbing.massInDomain(40) < 95, summary2);

        // a probe on the wall's far side: found while computing, one line, no output folder
        Files.writeString(file, SIDE_WALL.replace("y = 0.0\n", "y = -1.0\n"),
            StandardCharsets.UTF_8);
        final Path out3 = dir.resolve("out3");
        Cli.run("run", file.toString(), "--out", out3.toString())
            .userError("wall.toml", "y = -1.0", ">= 0");
        assertFalse(Files.exists(out3));
        // a release point on the wall
        Files.writeString(file, SIDE_WALL.replace("y0 = 2.0", "y0 = 0.0"),
            StandardCharsets.UTF_8);
        Cli.run("run", file.toString(), "--out", out3.toString())
            .userError("wall.toml", "release-wall-2d", "y0 = 0.0");
        assertFalse(Files.exists(out3));
    }

    /** A release towards an absorbing inlet face on the half-line: x < 0 is outside. */
    @Test
    void runOnTheHalfLine(@TempDir Path dir) throws IOException {
        final String scenario = String.join("\n",
            "family = \"release-wall-1d\"",
            "[medium]",
            "v = -0.5",
            "D = 0.1",
            "[source]",
            "wall = \"absorbing\"",
            "x0 = 1.0",
            "[profiles]",
            "times = [0.5, 1.0]",
            "x = { from = 0.0, to = 6.0, points = 3001 }",
            "");
        final Path file = dir.resolve("line.toml");
        Files.writeString(file, scenario, StandardCharsets.UTF_8);
        final String summary = Cli.run("run", file.toString(), "--out",
            dir.resolve("out").toString()).ok();
        final Matcher m = Pattern.compile("relative difference (\\S+)\\)").matcher(summary);
        int found = 0;
        while (m.find()) {
            assertTrue(Math.abs(Double.parseDouble(m.group(1))) < 1e-5, m.group());
            found++;
        }
        assertEquals(2, found, summary);
        Files.writeString(file, scenario.replace("from = 0.0", "from = -1.0"),
            StandardCharsets.UTF_8);
        Cli.run("run", file.toString(), "--out", dir.resolve("bad").toString())
            .userError("line.toml", "profiles.x", "outside the domain of release-wall-1d");
    }
}
