package org.advecta.benchmarks;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleBinaryOperator;
import org.advecta.solution.Solution1D;

/**
 * Where the naive formulas break: for each {@link SolutionFamily}, scans the Péclet number
 * Pe = vx/D upward on a log grid (1 to 1e8, 10 points per decade) and prints the smallest Pe at
 * which each naive form ({@link NaiveNumbers}, {@link NaiveMath3}) first returns NaN or ±∞, or
 * deviates from advecta's solution (the reference) by more than 1e−6 relative. Not a
 * benchmark: nothing is timed.
 *
 * <p>Setting (dimensionless): x = 1, v = 1, R = 1.5, D = vx/Pe; μ = 0.1 for the decaying
 * families (Damköhler μx/v = 0.1, fixed along the scan); c₀ = 1; pulse duration
 * t₀ = 0.25·Rx/v; step at x₀ = 0; slug on (−0.25, 0). Three times around the front,
 * t = f·Rx/v for f = 0.5 (ahead of the front), 1 (at it) and 2 (behind it); a grid point fails
 * if any of the three fails. Where the reference itself is 0 or subnormal, only NaN and ±∞
 * count (a relative deviation means nothing there); such points are counted and reported.
 *
 * <p>Run after packaging the benchmarks:
 * {@code java -cp benchmarks/target/benchmarks.jar org.advecta.benchmarks.NaiveFailureScan}.
 */
public final class NaiveFailureScan {

    /** Relative deviation from the reference that counts as a failure. */
    static final double TOLERANCE = 1e-6;
    /** Grid points per decade of Pe. */
    static final int PER_DECADE = 10;
    /** Decades scanned: Pe = 1 .. 10^DECADES. */
    static final int DECADES = 8;
    /** Times t = f·Rx/v around the front. */
    static final double[] FRONT_FACTORS = {0.5, 1, 2};

    private static final double X = 1;
    private static final double V = 1;
    private static final double R = 1.5;
    private static final double MU = 0.1;
    private static final double C0 = 1;

    private NaiveFailureScan() {
    }

    /** The first failure of one naive form of one family. */
    private static final class Failure {
        double pe = Double.NaN;
        double f;
        String kind;
        double naive;
        double reference;
        /** Largest relative deviation at the grid points before the first failure. */
        double worstBefore;
        /** Grid points at or after the first failure that fail too. */
        int failingAfter;
        int scannedAfter;
    }

    public static void main(String[] args) {
        final int n = DECADES * PER_DECADE + 1;
        System.out.printf(Locale.ROOT, "Naive-formula failure scan: Pe = vx/D = 10^(k/%d), k = 0..%d (1 to 1e%d);"
                + " x = %s, v = %s, R = %s, D = vx/Pe, mu = %s (decaying families), c0 = %s,"
                + " pulse t0 = 0.25 Rx/v, step x0 = 0, slug (-0.25, 0); t = f Rx/v, f in {0.5, 1, 2}.%n"
                + "Failure: naive NaN or +-Inf, or |naive - ours| > %.0e |ours| where ours is a normal double.%n%n",
            PER_DECADE, n - 1, DECADES, X, V, R, MU, C0, TOLERANCE);
        final List<String[]> rows = new ArrayList<>();
        final List<String> details = new ArrayList<>();
        int referenceTiny = 0;
        int points = 0;
        for (SolutionFamily family : SolutionFamily.values()) {
            final Failure numbers = new Failure();
            final Failure math3 = new Failure();
            for (int k = 0; k < n; k++) {
                final double pe = Math.pow(10, (double) k / PER_DECADE);
                final SolutionFamily.Setting s = setting(pe);
                final Solution1D ours = family.ours(s);
                final DoubleBinaryOperator naiveNumbers = family.numbers(s);
                final DoubleBinaryOperator naiveMath3 = family.math3(s);
                for (double f : FRONT_FACTORS) {
                    final double t = f * R * X / V;
                    final double c = ours.value(X, t);
                    points++;
                    if (!Double.isFinite(c)) {
                        throw new IllegalStateException(String.format(Locale.ROOT,
                            "%s: ours not finite at Pe = %s, f = %s: %s", family.key, pe, f, c));
                    }
                    if (Math.abs(c) < Double.MIN_NORMAL) {
                        referenceTiny++;
                    }
                }
                record(numbers, pe, ours, naiveNumbers);
                record(math3, pe, ours, naiveMath3);
            }
            rows.add(new String[] {family.key, cell(numbers), cell(math3)});
            details.add(detail(family.key, "Numbers", numbers));
            details.add(detail(family.key, "Math3", math3));
        }
        System.out.println("| family | naive Commons Numbers: first failing Pe | naive Commons Math 3: first failing Pe |");
        System.out.println("| --- | --- | --- |");
        for (String[] row : rows) {
            System.out.printf(Locale.ROOT, "| %s | %s | %s |%n", row[0], row[1], row[2]);
        }
        System.out.printf(Locale.ROOT, "%nAt the first failure (naive vs ours), the largest relative deviation at the"
            + " grid points below it, and how many grid points from it upward fail:%n");
        for (String line : details) {
            System.out.println(line);
        }
        System.out.printf(Locale.ROOT, "%nours was finite at all %d (family, Pe, f) points; 0 or subnormal at %d of"
            + " them (only NaN/Inf of the naive forms counted there).%n", points, referenceTiny);
    }

    private static SolutionFamily.Setting setting(double pe) {
        final double d = V * X / pe;
        return new SolutionFamily.Setting(V, d, R, MU, C0, 0.25 * R * X / V, 0.0, -0.25, 0.0);
    }

    /** Checks one naive form at the three times of one grid point. */
    private static void record(Failure failure, double pe, Solution1D ours, DoubleBinaryOperator naive) {
        boolean failed = false;
        double worst = 0;
        for (double f : FRONT_FACTORS) {
            final double t = f * R * X / V;
            final double c = ours.value(X, t);
            final double value = naive.applyAsDouble(X, t);
            final String kind;
            if (Double.isNaN(value)) {
                kind = "NaN";
            } else if (Double.isInfinite(value)) {
                kind = value > 0 ? "+Inf" : "-Inf";
            } else if (Math.abs(c) >= Double.MIN_NORMAL) {
                final double rel = Math.abs(value - c) / Math.abs(c);
                worst = Math.max(worst, rel);
                kind = rel > TOLERANCE ? String.format(Locale.ROOT, "rel. dev. %.1e", rel) : null;
            } else {
                kind = null;
            }
            if (kind != null && !failed) {
                failed = true;
                if (Double.isNaN(failure.pe)) {
                    failure.pe = pe;
                    failure.f = f;
                    failure.kind = kind;
                    failure.naive = value;
                    failure.reference = c;
                }
            }
        }
        if (Double.isNaN(failure.pe)) {
            failure.worstBefore = Math.max(failure.worstBefore, worst);
        } else {
            failure.scannedAfter++;
            failure.failingAfter += failed ? 1 : 0;
        }
    }

    private static String cell(Failure failure) {
        if (Double.isNaN(failure.pe)) {
            return String.format(Locale.ROOT, "none up to 1e%d", DECADES);
        }
        return String.format(Locale.ROOT, "%.3g (f = %s: %s)", failure.pe, fmt(failure.f), failure.kind);
    }

    private static String detail(String family, String library, Failure failure) {
        if (Double.isNaN(failure.pe)) {
            return String.format(Locale.ROOT, "  %-15s %-8s no failure; max relative deviation %.1e",
                family, library, failure.worstBefore);
        }
        return String.format(Locale.ROOT,
            "  %-15s %-8s Pe = %.3g, f = %s: naive %.17g vs ours %.17g; below: max rel. dev. %.1e;"
                + " failing at %d of %d grid points from there",
            family, library, failure.pe, fmt(failure.f), failure.naive, failure.reference,
            failure.worstBefore, failure.failingAfter, failure.scannedAfter);
    }

    private static String fmt(double f) {
        return f == Math.rint(f) ? Long.toString((long) f) : Double.toString(f);
    }
}
