package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.advecta.kernel.FreeSpaceKernel2D;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialStep;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;
import org.advecta.verify.CellAverages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code advecta check}: exact data give zero norms, a perturbed field gives the norms computed
 * here independently (plain sums), refinement files with an error of known order give that
 * order, and -o writes the library's exact values and the errors.
 */
class CheckCommandTest {

    private static final Solution1D GAUSSIAN = InitialGaussian.of(
        TransportParameters.of(1.0, 0.01), 0.2, 0.1, 1.0);
    private static final String[] GAUSSIAN_ARGS = {"gaussian", "v=1", "D=0.01", "xc=0.2",
        "s0=0.1"};

    private static String[] args(String[] head, String[] family, String... tail) {
        final List<String> all = new ArrayList<>(List.of(head));
        all.addAll(List.of(family));
        all.addAll(List.of(tail));
        return all.toArray(new String[0]);
    }

    /** The printed value in the row of a norm: column 1 absolute, 2 relative. */
    private static double printed(String out, String norm, int column) {
        for (String line : out.split("\n")) {
            final String[] f = line.trim().split("\\s+");
            if (f[0].equals(norm)) {
                return Double.parseDouble(f[column]);
            }
        }
        throw new AssertionError(norm + " missing from " + out);
    }

    @Test
    void exactDataGiveZeroNorms(@TempDir Path dir) throws IOException {
        final List<String> rows = new ArrayList<>();
        for (int i = 0; i <= 100; i++) {
            final double x = -0.5 + 0.02 * i;
            rows.add(x + ",0.5," + GAUSSIAN.value(x, 0.5));
        }
        final Path sim = dir.resolve("sim.csv");
        FitCommandTest.writeCsv(sim, "x,t,c", rows);
        final String out = Cli.run(args(new String[] {"check", sim.toString()},
            GAUSSIAN_ARGS)).ok();
        for (String norm : new String[] {"L1", "L2", "Linf"}) {
            assertEquals(0.0, printed(out, norm, 1), out);
            assertEquals(0.0, printed(out, norm, 2), out);
        }
        assertTrue(out.contains("101 point values, weights equal (1/n)"), out);

        // a 2D family, exact values
        final FreeSpaceKernel2D k = FreeSpaceKernel2D.of(TransportParameters.of(0.25, 0.5)
            .withDispersion(0.5, 0.05, 0.05), 0, 0);
        final List<String> plane = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            for (int j = 0; j < 5; j++) {
                final double x = 2.0 * i;
                final double y = -4.0 + 2.0 * j;
                plane.add(x + "," + y + ",60," + 2e5 * k.value(x, y, 60));
            }
        }
        final Path sim2 = dir.resolve("plane.csv");
        FitCommandTest.writeCsv(sim2, "x,y,t,c", plane);
        final String out2 = Cli.run("check", sim2.toString(), "release-2d", "v=0.25", "D=0.5",
            "DT=0.05", "M=2e5").ok();
        for (String norm : new String[] {"L1", "L2", "Linf"}) {
            assertEquals(0.0, printed(out2, norm, 1), out2);
        }
    }

    @Test
    void perturbedFieldGivesTheIndependentlyComputedNormsAndOutputTable(@TempDir Path dir)
            throws IOException {
        final int n = 80;
        final double[] x = new double[n];
        final double[] c = new double[n];
        final double[] e = new double[n];
        final double[] w = new double[n];
        final List<String> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            x[i] = -0.3 + 0.0125 * i;
            final double t = i < n / 2 ? 0.25 : 0.5;
            c[i] = GAUSSIAN.value(x[i], t) + 1e-3 * Math.sin(7.0 * i);
            w[i] = 0.5 + (i % 4) * 0.25;
            rows.add(x[i] + "," + t + "," + c[i] + "," + w[i]);
            e[i] = c[i] - GAUSSIAN.value(x[i], t);
        }
        final Path sim = dir.resolve("sim.csv");
        FitCommandTest.writeCsv(sim, "x,t,c,w", rows);
        final Path table = dir.resolve("errors.csv");
        final String out = Cli.run(args(new String[] {"check", sim.toString()}, GAUSSIAN_ARGS,
            "-o", table.toString())).ok();
        // independent: plain loops over the definitions, weights as given
        double l1 = 0;
        double l2 = 0;
        double lInf = 0;
        double x1 = 0;
        double x2 = 0;
        double xInf = 0;
        for (int i = 0; i < n; i++) {
            final double exact = c[i] - e[i];
            l1 += w[i] * Math.abs(e[i]);
            l2 += w[i] * e[i] * e[i];
            lInf = Math.max(lInf, Math.abs(e[i]));
            x1 += w[i] * Math.abs(exact);
            x2 += w[i] * exact * exact;
            xInf = Math.max(xInf, Math.abs(exact));
        }
        l2 = Math.sqrt(l2);
        x2 = Math.sqrt(x2);
        assertEquals(l1, printed(out, "L1", 1), 1e-13 * l1, out);
        assertEquals(l2, printed(out, "L2", 1), 1e-13 * l2, out);
        assertEquals(lInf, printed(out, "Linf", 1), 0.0, out);
        assertEquals(l1 / x1, printed(out, "L1", 2), 1e-13 * l1 / x1, out);
        assertEquals(l2 / x2, printed(out, "L2", 2), 1e-13 * l2 / x2, out);
        assertEquals(lInf / xInf, printed(out, "Linf", 2), 1e-15 * lInf / xInf, out);
        assertTrue(out.contains("weights from column w"), out);
        assertTrue(out.contains("Wrote:"), out);

        final List<String> lines = Files.readAllLines(table, StandardCharsets.UTF_8);
        assertEquals("x,t,c,w,exact,error", lines.get(0));
        for (int i = 0; i < n; i++) {
            final String[] f = lines.get(i + 1).split(",");
            assertEquals(rows.get(i), String.join(",", f[0], f[1], f[2], f[3]));
            final double exact = GAUSSIAN.value(Double.parseDouble(f[0]),
                Double.parseDouble(f[1]));
            assertEquals(Double.doubleToLongBits(exact),
                Double.doubleToLongBits(Double.parseDouble(f[4])));
            assertEquals(Double.doubleToLongBits(c[i] - exact),
                Double.doubleToLongBits(Double.parseDouble(f[5])));
        }
    }

    @Test
    void cellAveragesAreComparedWithExactCellAveragesWeightedByWidth(@TempDir Path dir)
            throws IOException {
        final Solution1D step = InitialStep.of(TransportParameters.of(1.0, 0.01), 0.25, 1.0,
            InitialStep.Side.LEFT);
        final int n = 40;
        final List<String> rows = new ArrayList<>();
        double l1 = 0;
        double l2 = 0;
        double lInf = 0;
        for (int i = 0; i < n; i++) {
            // uneven cells on [0, 1]
            final double a = Math.pow(i / (double) n, 1.2);
            final double b = Math.pow((i + 1) / (double) n, 1.2);
            final double exact = CellAverages.average(step, a, b, 0.3);
            final double c = exact + ((i % 2 == 0) ? 2e-4 : -1e-4);
            rows.add(a + "," + b + ",0.3," + c);
            final double err = c - exact;
            l1 += (b - a) * Math.abs(err);
            l2 += (b - a) * err * err;
            lInf = Math.max(lInf, Math.abs(err));
        }
        final Path sim = dir.resolve("cells.csv");
        FitCommandTest.writeCsv(sim, "x_left,x_right,t,c", rows);
        final String out = Cli.run("check", sim.toString(), "step", "v=1", "D=0.01", "x0=0.25",
            "--cells").ok();
        assertTrue(out.contains("40 cell averages, weights the cell widths"), out);
        assertEquals(l1, printed(out, "L1", 1), 1e-13 * l1, out);
        assertEquals(Math.sqrt(l2), printed(out, "L2", 1), 1e-13 * Math.sqrt(l2), out);
        assertEquals(lInf, printed(out, "Linf", 1), 1e-15 * lInf, out);
    }

    /** c = exact + s·h^2 with s = ±1: every norm is h^2 (up to rounding), order 2. */
    private static Path level(Path dir, String name, int cells, Solution1D exact, boolean alt)
            throws IOException {
        final double h = 1.0 / cells;
        final List<String> rows = new ArrayList<>();
        for (int i = 0; i <= cells; i++) {
            final double x = i * h;
            final double s = alt && i % 2 == 1 ? -1 : 1;
            rows.add(x + ",0.5," + (exact.value(x, 0.5) + s * h * h));
        }
        final Path file = dir.resolve(name);
        FitCommandTest.writeCsv(file, "x,t,c", rows);
        return file;
    }

    private static double[] orderRow(String out, String norm) {
        boolean inOrders = false;
        for (String line : out.split("\n")) {
            if (line.startsWith("Observed order")) {
                inOrders = true;
            } else if (inOrders && line.startsWith(norm + " ")) {
                final String[] f = line.substring(norm.length()).trim().split(",?\\s+");
                final double[] v = new double[f.length];
                for (int i = 0; i < f.length; i++) {
                    v[i] = Double.parseDouble(f[i]);
                }
                return v;
            }
        }
        throw new AssertionError(norm + " order missing from " + out);
    }

    @Test
    void threeRefinementLevelsGiveTheirKnownOrder(@TempDir Path dir) throws IOException {
        final Path coarse = level(dir, "coarse.csv", 10, GAUSSIAN, true);
        final Path mid = level(dir, "mid.csv", 20, GAUSSIAN, true);
        final Path fine = level(dir, "fine.csv", 40, GAUSSIAN, true);
        // mesh sizes inferred from the coordinates (0.1, 0.05, 0.025)
        final String out = Cli.run(args(new String[] {"check", coarse.toString()},
            GAUSSIAN_ARGS, "--refine", mid.toString(), fine.toString())).ok();
        assertTrue(out.contains("mesh sizes inferred from the coordinates"), out);
        for (String norm : new String[] {"L1", "L2", "Linf"}) {
            final double[] r = orderRow(out, norm);
            // pairwise (2 values), least squares, its standard error
            assertEquals(4, r.length, out);
            for (int i = 0; i < 3; i++) {
                assertEquals(2.0, r[i], 1e-9, norm + ": " + out);
            }
            assertEquals(0.0, r[3], 1e-9);
        }
        // the same files in another order, given before the family, with --h
        final String again = Cli.run(args(new String[] {"check", fine.toString(),
            coarse.toString(), mid.toString()}, GAUSSIAN_ARGS, "--h", "0.025,0.1,0.05")).ok();
        assertTrue(again.contains("mesh sizes from --h"), again);
        assertEquals(2.0, orderRow(again, "L2")[2], 1e-9, again);
        // rows coarsest first
        assertTrue(again.indexOf("coarse.csv") < again.indexOf("mid.csv")
            && again.indexOf("mid.csv") < again.indexOf("fine.csv"), again);
    }

    @Test
    void cellRefinementLevelsGiveTheirKnownOrderWithInferredWidths(@TempDir Path dir)
            throws IOException {
        final Solution1D step = InitialStep.of(TransportParameters.of(1.0, 0.01), 0.25, 1.0,
            InitialStep.Side.LEFT);
        final List<String> args = new ArrayList<>(List.of("check"));
        for (int cells : new int[] {10, 20, 40}) {
            final double h = 1.0 / cells;
            final List<String> rows = new ArrayList<>();
            for (int i = 0; i < cells; i++) {
                final double a = i * h;
                final double b = (i + 1) * h;
                // error +-h on alternate cells: every norm is h (width weights sum to 1)
                rows.add(a + "," + b + ",0.3," + (CellAverages.average(step, a, b, 0.3)
                    + (i % 2 == 0 ? h : -h)));
            }
            final Path file = dir.resolve("cells" + cells + ".csv");
            FitCommandTest.writeCsv(file, "x_left,x_right,t,c", rows);
            args.add(file.toString());
        }
        args.addAll(List.of("step", "v=1", "D=0.01", "x0=0.25", "--cells"));
        final String out = Cli.run(args.toArray(new String[0])).ok();
        assertTrue(out.contains("cell averages, weights the cell widths"), out);
        for (String norm : new String[] {"L1", "L2", "Linf"}) {
            final double[] r = orderRow(out, norm);
            for (int i = 0; i < 3; i++) {
                assertEquals(1.0, r[i], 1e-9, norm + ": " + out);
            }
        }
    }

    @Test
    void gridConvergenceIndexOfThreeLevels(@TempDir Path dir) throws IOException {
        // A uniform exact field (background, no decay) and c = 1 + h^2: phi = mean c = 1 + h^2,
        // so the apparent order is 2 and the extrapolated phi is the exact 1.
        final Solution1D uniform = org.advecta.solution.DecayingBackground.of(
            TransportParameters.of(1.0, 0.01), 1.0);
        final Path a = level(dir, "a.csv", 8, uniform, false);
        final Path b = level(dir, "b.csv", 16, uniform, false);
        final Path c = level(dir, "c.csv", 32, uniform, false);
        final String out = Cli.run("check", a.toString(), b.toString(), c.toString(),
            "background", "v=1", "D=0.01").ok();
        double order = Double.NaN;
        double extrapolated = Double.NaN;
        for (String line : out.split("\n")) {
            final String[] f = line.trim().split("\\s{2,}");
            if (f[0].equals("apparent order")) {
                order = Double.parseDouble(f[1]);
            } else if (f[0].equals("extrapolated phi")) {
                extrapolated = Double.parseDouble(f[1]);
            }
        }
        assertEquals(2.0, order, 1e-9, out);
        assertEquals(1.0, extrapolated, 1e-12, out);
        assertEquals(2.0, orderRow(out, "L1")[2], 1e-9, out);
        assertTrue(out.contains("GCI"), out);
    }
}
