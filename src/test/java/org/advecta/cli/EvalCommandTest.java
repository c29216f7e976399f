package org.advecta.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.kernel.FreeSpaceKernel2D;
import org.advecta.kernel.FreeSpaceKernel3D;
import org.advecta.solution.DecayingBackground;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code eval} reproduces the library's values bit for bit: for every family, the columns
 * c, gradient and flux read back (Double.parseDouble) to exactly the doubles that the
 * library's own classes, called directly here, return at the same points.
 */
class EvalCommandTest {

    /** The library's value, gradient components and flux components at one point. */
    @FunctionalInterface
    interface Reference {
        double[] at(double x, double y, double z, double t);
    }

    /** One family with one parameter set. */
    static final class Case {
        final String family;
        final List<String> args;
        final int dimensions;
        final boolean halfLine;
        final Reference reference;
        /** Whether eval gives gradient and flux columns (not for the continuous sources). */
        final boolean derivatives;
        /** Whether eval gives the c_error column (the quadrature families). */
        final boolean errorBound;

        Case(String family, int dimensions, boolean halfLine, Reference reference,
             String... args) {
            this(family, dimensions, halfLine, reference, true, false, List.of(args));
        }

        private Case(String family, int dimensions, boolean halfLine, Reference reference,
                     boolean derivatives, boolean errorBound, List<String> args) {
            this.family = family;
            this.dimensions = dimensions;
            this.halfLine = halfLine;
            this.reference = reference;
            this.derivatives = derivatives;
            this.errorBound = errorBound;
            this.args = args;
        }

        /** A case of values only: the reference returns {c}. */
        static Case values(String family, int dimensions, Reference reference, String... args) {
            return new Case(family, dimensions, false, reference, false, false, List.of(args));
        }

        /** A case of values with --error: the reference returns {c, c_error}. */
        static Case bounded(String family, int dimensions, Reference reference,
                            String... args) {
            return new Case(family, dimensions, false, reference, false, true, List.of(args));
        }

        @Override
        public String toString() {
            return family + " " + String.join(" ", args);
        }
    }

    private static Reference line(Solution1D s) {
        return (x, y, z, t) -> new double[] {s.value(x, t), s.gradient(x, t), s.flux(x, t)};
    }

    private static TransportParameters tp(double v, double d, double r, double mu) {
        return TransportParameters.of(v, d).withRetardation(r).withDecay(mu);
    }

    static Stream<Case> cases() {
        final TransportParameters column = tp(0.6, 5e-3, 1.5, 0.01);
        final FreeSpaceKernel1D k1 = FreeSpaceKernel1D.of(tp(0.5, 0.1, 1.3, 0.02), 1.0);
        final FreeSpaceKernel2D k2 = FreeSpaceKernel2D.of(
            tp(0.25, 0.5, 1.0, 0.0).withDispersion(0.5, 0.05, 0.05), 1.0, -1.0);
        final FreeSpaceKernel3D k3 = FreeSpaceKernel3D.of(
            tp(0.4, 0.2, 2.0, 1e-3).withDispersion(0.2, 0.02, 0.004), 0.5, 0.25, -0.5);
        return Stream.concat(Stream.of(
            new Case("step", 1, false, line(InitialStep.of(column, 0.2, 3.0,
                InitialStep.Side.RIGHT)),
                "v=0.6", "D=5e-3", "R=1.5", "mu=0.01", "x0=0.2", "C0=3", "side=right"),
            new Case("step", 1, false, line(InitialStep.of(TransportParameters.of(-1, 0.1),
                0, 1, InitialStep.Side.LEFT)), "v=-1", "D=0.1"),
            new Case("slug", 1, false, line(InitialSlug.of(TransportParameters.of(-0.3, 0.02),
                -1.0, 0.5, 2.0)), "v=-0.3", "D=0.02", "a=-1", "b=0.5", "C0=2"),
            new Case("gaussian", 1, false, line(InitialGaussian.of(tp(1, 0.1, 2, 0.1), 2.0,
                0.3, 5.0)), "v=1", "D=0.1", "R=2", "mu=0.1", "xc=2", "s0=0.3", "M=5"),
            new Case("background", 1, false, line(DecayingBackground.of(tp(1, 1, 1.2, 0.05),
                7.0)), "v=1", "D=1", "R=1.2", "mu=0.05", "Cb=7"),
            new Case("inlet-first", 1, true, line(FirstTypeInlet.of(column,
                InletInput.constant(500))), "v=0.6", "D=5e-3", "R=1.5", "mu=0.01", "C0=500"),
            new Case("inlet-first", 1, true, line(FirstTypeInlet.of(column,
                InletInput.pulse(2.0, 0.5)).withInitialConcentration(0.1)),
                "v=0.6", "D=5e-3", "R=1.5", "mu=0.01", "input=pulse", "C0=2", "t0=0.5",
                "Ci=0.1"),
            new Case("inlet-first", 1, true, line(FirstTypeInlet.of(tp(-0.2, 0.05, 1, 0),
                InletInput.exponential(1.0, 0.15))),
                "v=-0.2", "D=0.05", "input=exponential", "lambda=0.15"),
            new Case("inlet-third", 1, true, line(ThirdTypeInlet.of(column,
                InletInput.constant(500))), "v=0.6", "D=5e-3", "R=1.5", "mu=0.01", "C0=500"),
            new Case("inlet-third", 1, true, line(ThirdTypeInlet.of(column,
                InletInput.pulse(2.0, 0.5)).withInitialConcentration(0.1)),
                "v=0.6", "D=5e-3", "R=1.5", "mu=0.01", "input=pulse", "C0=2", "t0=0.5",
                "Ci=0.1"),
            new Case("inlet-third", 1, true, line(ThirdTypeInlet.of(tp(0.2, 0.05, 1, 0.01),
                InletInput.exponential(3.0, -0.1))),
                "v=0.2", "D=0.05", "mu=0.01", "input=exponential", "C0=3", "lambda=-0.1"),
            new Case("release-1d", 1, false, (x, y, z, t) -> new double[] {
                3.0 * k1.value(x, t), 3.0 * k1.gradient(x, t), 3.0 * k1.flux(x, t)},
                "v=0.5", "D=0.1", "R=1.3", "mu=0.02", "x0=1", "M=3"),
            new Case("release-2d", 2, false, (x, y, z, t) -> new double[] {
                4.0 * k2.value(x, y, t), 4.0 * k2.gradientX(x, y, t),
                4.0 * k2.gradientY(x, y, t), 4.0 * k2.fluxX(x, y, t), 4.0 * k2.fluxY(x, y, t)},
                "v=0.25", "D=0.5", "DT=0.05", "x0=1", "y0=-1", "M=4"),
            new Case("release-3d", 3, false, (x, y, z, t) -> new double[] {
                k3.value(x, y, z, t), k3.gradientX(x, y, z, t), k3.gradientY(x, y, z, t),
                k3.gradientZ(x, y, z, t), k3.fluxX(x, y, z, t), k3.fluxY(x, y, z, t),
                k3.fluxZ(x, y, z, t)},
                "v=0.4", "D=0.2", "DT=0.02", "DV=0.004", "R=2", "mu=1e-3", "x0=0.5", "y0=0.25",
                "z0=-0.5")),
            Stream.concat(PlumeCases.cases(), HalfSpaceCases.cases()));
    }

    @Test
    void everyRegisteredFamilyHasACase() {
        final Set<String> tested = cases().map(c -> c.family)
            .collect(Collectors.toCollection(TreeSet::new));
        final Set<String> registered = Families.ALL.stream().map(Family::name)
            .collect(Collectors.toCollection(TreeSet::new));
        assertEquals(registered, tested);
    }

    /** Points as text, as a user would write them; some not in the shortest form. */
    private static String points(Case c) {
        final String[] xs = c.halfLine
            ? new String[] {"0", "1e-3", "0.05", "0.35", "1.0", "4"}
            : new String[] {"-2.5", "-0.1", "0", "0.2", "0.35", "1.0", "3E0", "12.75"};
        final String[] others = {"-1.5", "0.0", "0.4"};
        final String[] ts = {"0", "0.001", "0.1", "0.5", "2", "10.0", "250"};
        final StringBuilder b = new StringBuilder();
        b.append(String.join(",", c.dimensions == 1 ? List.of("t", "x")
            : c.dimensions == 2 ? List.of("t", "x", "y") : List.of("t", "x", "y", "z")))
            .append('\n');
        for (String t : ts) {
            for (String x : xs) {
                for (int k = 0; k < (c.dimensions == 1 ? 1 : others.length); k++) {
                    b.append(t).append(',').append(x);
                    if (c.dimensions >= 2) {
                        b.append(',').append(others[k]);
                    }
                    if (c.dimensions >= 3) {
                        b.append(',').append(others[others.length - 1 - k]);
                    }
                    b.append('\n');
                }
            }
        }
        return b.toString();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reproducesTheLibraryBitForBit(Case c) {
        final List<String> args = new ArrayList<>(List.of("eval", c.family));
        args.addAll(c.args);
        if (c.derivatives) {
            args.add("--gradient");
            args.add("--flux");
        }
        if (c.errorBound) {
            args.add("--error");
        }
        final String input = points(c);
        final String out = Cli.runWithInput(input, args.toArray(String[]::new)).ok();
        final String[] lines = out.split("\n");
        final String[] inLines = input.split("\n");
        assertEquals(inLines.length, lines.length);
        final String[] axes = {"x", "y", "z"};
        final List<String> header = new ArrayList<>(Arrays.asList(inLines[0].split(",")));
        header.add("c");
        if (c.errorBound) {
            header.add("c_error");
        }
        for (int k = 0; c.derivatives && k < c.dimensions; k++) {
            header.add("dcd" + axes[k]);
        }
        for (int k = 0; c.derivatives && k < c.dimensions; k++) {
            header.add("j" + axes[k]);
        }
        assertEquals(String.join(",", header), lines[0]);
        int finite = 0;
        for (int i = 1; i < lines.length; i++) {
            final String[] in = inLines[i].split(",");
            final String[] cells = lines[i].split(",", -1);
            // the input cells come back as they were written
            assertEquals(Arrays.asList(in), Arrays.asList(cells).subList(0, in.length));
            final double t = Double.parseDouble(in[0]);
            final double x = Double.parseDouble(in[1]);
            final double y = c.dimensions >= 2 ? Double.parseDouble(in[2]) : 0;
            final double z = c.dimensions >= 3 ? Double.parseDouble(in[3]) : 0;
            final double[] expected = c.reference.at(x, y, z, t);
            assertEquals(expected.length, cells.length - in.length, lines[i]);
            for (int k = 0; k < expected.length; k++) {
                final double got = Double.parseDouble(cells[in.length + k]);
                final int column = k;
                final int row = i;
                assertEquals(Double.doubleToRawLongBits(expected[k]),
                    Double.doubleToRawLongBits(got),
                    () -> c + ", row " + inLines[row] + ", column " + (in.length + column)
                        + ": expected " + expected[column] + ", got " + got);
                if (Double.isFinite(got) && got != 0) {
                    finite++;
                }
            }
        }
        // with gradient and flux, more non-zero values than rows; with c (and c_error) only,
        // non-zero values in more than half of the rows (c = 0 at t = 0 for a source)
        final int needed = c.derivatives ? lines.length : (lines.length - 1) / 2;
        assertTrue(finite > needed, "too few non-zero values to compare: " + finite);
    }

    @Test
    void otherColumnsPassThroughAndQuotedCellsStayQuoted() {
        final String out = Cli.runWithInput(
            "well,x,t,note\nA,0.35,0.5,\"first, shallow\"\n# a comment\n\nB,1,2,deep\n",
            "eval", "inlet-third", "v=0.6", "D=5e-3", "R=1.5", "mu=0.01", "C0=500").ok();
        final ThirdTypeInlet s = ThirdTypeInlet.of(tp(0.6, 5e-3, 1.5, 0.01),
            InletInput.constant(500));
        assertEquals("well,x,t,note,c\n"
            + "A,0.35,0.5,\"first, shallow\"," + s.value(0.35, 0.5) + "\n"
            + "B,1,2,deep," + s.value(1, 2) + "\n", out);
    }

    @Test
    void writesAFileWithTheSameContentAsStandardOutput(@TempDir Path dir) throws IOException {
        final Path points = dir.resolve("points.csv");
        Files.writeString(points, "x,t\n0.1,1\n0.2,1\n", StandardCharsets.UTF_8);
        final Path result = dir.resolve("c.csv");
        final String[] args = {"eval", "gaussian", "v=1", "D=0.1", "s0=0.2", "--flux",
            "-i", points.toString()};
        final String stdout = Cli.run(args).ok();
        final List<String> withFile = new ArrayList<>(List.of(args));
        withFile.addAll(List.of("-o", result.toString()));
        assertEquals("", Cli.run(withFile.toArray(String[]::new)).ok());
        assertEquals(stdout, Files.readString(result, StandardCharsets.UTF_8));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(Set.of("points.csv", "c.csv"),
                files.map(p -> p.getFileName().toString()).collect(Collectors.toSet()));
        }
    }
}
