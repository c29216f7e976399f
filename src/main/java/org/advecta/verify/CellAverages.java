package org.advecta.verify;

import org.advecta.internal.Checks;
import org.advecta.internal.GaussLegendre;
import org.advecta.solution.Domain;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.Exponentials;
import org.advecta.transport.TransportParameters;

/**
 * Exact cell averages c̄ = (1/(b − a)) ∫ c(x, t) dx over [a, b] of a library solution: what a
 * finite-volume code holds in its cells. Comparing cell averages with point values at the
 * cell centres makes an error of (h²/24)·∂²c/∂x² look like discretisation error (or hide
 * one), which spoils any second-order study.
 *
 * <p><b>Closed forms</b> (antiderivatives in x), with L = √(4Dt/R), E = exp(−μt/R), the
 * moving centre m = x_c + vt/R and u = (x − m)/L:
 * <pre>
 * step:     ∫ ½erfc(u) dx = (L/2)·[ierfc(u_a) − ierfc(u_b)],  ierfc(u) = e^{−u²}/√π − u·erfc(u)
 * slug:     difference of two steps (at its two ends)
 * Gaussian: ∫ c dx = M·E·½·[erf((b − m)/(√2·S)) − erf((a − m)/(√2·S))],  S² = s₀² + 2Dt/R
 * </pre>
 * (ierfc is the first repeated integral of erfc, Abramowitz &amp; Stegun 7.2.1 and 7.2.3;
 * d ierfc/du = −erfc(u)). For u ≥ 0, ierfc(u) = −½e^{−u²}·erfcx′(u) is formed without
 * cancellation; on the loaded side of a step the integrand is written 1 − ½erfc(−u), so no
 * large ierfc values are subtracted. The Gaussian uses
 * {@link ErrorFunctions#erfDifferenceCentred(double, double)}, exact also for narrow cells.
 * At t = 0 the closed forms give the exact averages of the discontinuous initial data.
 *
 * <p><b>Quadrature otherwise</b> (the inlet families, and a step or slug cell narrower than
 * L, where a difference of antiderivatives would cancel): the 10-point Gauss–Legendre rule
 * (Abramowitz &amp; Stegun 25.4.29) on pieces no wider than L (for a pulse input after its end,
 * no wider than the L of t − t₀), each piece bisected until the rule on the whole piece and on
 * its two halves agree to {@value #AGREEMENT} relative (or to 2⁻⁵² of the piece's largest
 * |c|). The rule's remainder is (h^{21}(10!)⁴/(21·(20!)³))·f^{(20)}(ξ) (A&amp;S 25.4.30); for
 * an erfc front of width L on a piece h ≤ L that bounds the error by about 1e-19·(h/L)^{20}
 * of the front's height.
 *
 * <p>Accuracy (measured against 40-digit mpmath quadrature of the closed-form solutions, see
 * the tests): |c̄ − exact| ≤ 1e-15·max|c| of the family (the largest concentration of its
 * data) for the step, slug, Gaussian and both inlets with constant and pulse inputs. For a
 * solution of another class (any {@link Solution1D}) the same adaptive rule is applied with
 * L from its parameters; its estimate assumes the solution varies on scales of L or wider.
 *
 * <p>Solutions wrapped in a {@link TimeShiftedSolution} use the closed form of the wrapped
 * family at t + t₀.
 */
public final class CellAverages {

    /** Agreement of the whole-piece and two-half-piece rules that ends a bisection. */
    private static final double AGREEMENT = 1e-10;
    /** Deepest bisection; 2⁻⁴⁰ of the starting piece is far below any solution's scale. */
    private static final int MAX_DEPTH = 40;
    /** Most starting pieces of a cell; wider cells rely on bisection where needed. */
    private static final int MAX_PIECES = 256;
    private static final double SQRT_PI = Math.sqrt(Math.PI);
    private static final double SQRT_2 = Math.sqrt(2.0);

    private CellAverages() {
    }

    /**
     * Returns the average of c(·, t) over the cell [a, b].
     *
     * <pre>
     * c̄ = (1/(b − a)) ∫ c(x, t) dx  over [a, b]
     * </pre>
     *
     * @param solution the exact solution
     * @param a left face, finite (≥ 0 on the half-line)
     * @param b right face, finite and &gt; a
     * @param t time, finite and ≥ 0
     * @return the cell average
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static double average(Solution1D solution, double a, double b, double t) {
        checkSolution(solution);
        checkCell(solution, a, b);
        Checks.nonNegative("t", t);
        return integral(solution, a, b, t) / (b - a);
    }

    /**
     * Cell averages on a grid given by its faces: {@code out[i]} is the average over
     * [faces[i], faces[i + 1]].
     *
     * @param solution the exact solution
     * @param faces the cell faces, finite and strictly increasing, at least two; not
     *     modified (unless it is also out)
     * @param t time, finite and ≥ 0
     * @param out receives the faces.length − 1 averages; may be faces itself (each face is
     *     read before the element holding it is written)
     * @throws IllegalArgumentException if an argument is invalid (out is then not written)
     */
    public static void averages(Solution1D solution, double[] faces, double t, double[] out) {
        checkSolution(solution);
        checkFaces(solution, faces);
        Checks.nonNegative("t", t);
        Checks.length("out", out, faces.length - 1);
        double left = faces[0];
        for (int i = 0; i + 1 < faces.length; i++) {
            final double right = faces[i + 1];
            out[i] = integral(solution, left, right, t) / (right - left);
            left = right;
        }
    }

    /** Validates a grid's faces (shared with the error norms). */
    static void checkFaces(Solution1D solution, double[] faces) {
        Checks.length("faces", faces, 2);
        for (int i = 0; i < faces.length; i++) {
            if (solution.domain() == Domain.HALF_LINE) {
                Checks.nonNegative("faces[" + i + "]", faces[i]);
            } else {
                Checks.finite("faces[" + i + "]", faces[i]);
            }
            if (i > 0 && !(faces[i] > faces[i - 1])) {
                throw Checks.fail("faces[" + i + "]", faces[i],
                    "faces must increase strictly, previous " + faces[i - 1]);
            }
        }
    }

    static void checkSolution(Solution1D solution) {
        if (solution == null) {
            throw new IllegalArgumentException("solution: must not be null");
        }
    }

    private static void checkCell(Solution1D solution, double a, double b) {
        if (solution.domain() == Domain.HALF_LINE) {
            Checks.nonNegative("a", a);
        } else {
            Checks.finite("a", a);
        }
        Checks.finite("b", b);
        if (!(b > a)) {
            throw Checks.fail("b", b, "must be > a = " + a);
        }
    }

    /** ∫ c(x, t) dx over [a, b], validated arguments. */
    private static double integral(Solution1D solution, double a, double b, double t) {
        Solution1D s = solution;
        double time = t;
        while (s instanceof TimeShiftedSolution) {
            final TimeShiftedSolution shifted = (TimeShiftedSolution) s;
            time += shifted.shift();
            s = shifted.original();
        }
        final TransportParameters p = s.parameters();
        final double r = p.retardation();
        final double spread = Math.sqrt(4 * p.dispersion() * time / r);
        if (s instanceof InitialGaussian) {
            return gaussian((InitialGaussian) s, a, b, time);
        }
        if (s instanceof InitialStep && (time == 0 || b - a >= spread)) {
            final InitialStep step = (InitialStep) s;
            return step(p, step.position(), step.concentration(),
                step.side() == InitialStep.Side.LEFT, a, b, time);
        }
        if (s instanceof InitialSlug && (time == 0 || b - a >= spread)) {
            return slug((InitialSlug) s, a, b, time);
        }
        if (time == 0 && s instanceof FirstTypeInlet) {
            // c(x, 0) = Cᵢ for x > 0 (the inlet value at the single point x = 0 has no mass)
            return ((FirstTypeInlet) s).initialConcentration() * (b - a);
        }
        if (time == 0 && s instanceof ThirdTypeInlet) {
            return ((ThirdTypeInlet) s).initialConcentration() * (b - a);
        }
        double scale = spread;
        final InletInput input = s instanceof FirstTypeInlet ? ((FirstTypeInlet) s).input()
            : s instanceof ThirdTypeInlet ? ((ThirdTypeInlet) s).input() : null;
        if (input != null && input.kind() == InletInput.Kind.PULSE && time > input.duration()) {
            scale = Math.sqrt(4 * p.dispersion() * (time - input.duration()) / r);
        }
        final Solution1D f = s;
        final double at = time;
        return quadrature(x -> f.value(x, at), a, b, scale);
    }

    /** Composite adaptive Gauss–Legendre over [a, b], starting pieces no wider than scale. */
    static double quadrature(java.util.function.DoubleUnaryOperator f, double a, double b,
                             double scale) {
        final double width = b - a;
        int pieces = 1;
        if (scale > 0 && width > scale) {
            pieces = (int) Math.min(MAX_PIECES, Math.ceil(width / scale));
        }
        final Sum sum = new Sum();
        for (int i = 0; i < pieces; i++) {
            final double p = i == 0 ? a : a + width * i / pieces;
            final double q = i == pieces - 1 ? b : a + width * (i + 1) / pieces;
            sum.add(adaptive(f, p, q, GaussLegendre.integrate(f, 0.5 * p + 0.5 * q,
                0.5 * q - 0.5 * p), 0));
        }
        return sum.value();
    }

    private static double adaptive(java.util.function.DoubleUnaryOperator f, double p,
                                   double q, double whole, int depth) {
        final double m = 0.5 * p + 0.5 * q;
        final double left = GaussLegendre.integrate(f, 0.5 * p + 0.5 * m, 0.5 * m - 0.5 * p);
        final double right = GaussLegendre.integrate(f, 0.5 * m + 0.5 * q, 0.5 * q - 0.5 * m);
        final double halves = left + right;
        final double magnitude = Math.max(Math.abs(f.applyAsDouble(p)),
            Math.max(Math.abs(f.applyAsDouble(m)), Math.abs(f.applyAsDouble(q))));
        final double difference = Math.abs(whole - halves);
        if (depth >= MAX_DEPTH || difference <= AGREEMENT * Math.abs(halves)
            || difference <= 0x1.0p-52 * magnitude * (q - p)) {
            return halves;
        }
        return adaptive(f, p, m, left, depth + 1) + adaptive(f, m, q, right, depth + 1);
    }

    /** ∫ over [a, b] of the Gaussian family: an erf difference over the cell. */
    private static double gaussian(InitialGaussian g, double a, double b, double t) {
        final TransportParameters p = g.parameters();
        final double r = p.retardation();
        final double s0 = g.width();
        final double variance = s0 * s0 + 2 * p.dispersion() * t / r;
        final double scale = 1 / (SQRT_2 * Math.sqrt(variance));
        final double centre = Math.fma(p.velocity() / r, t, g.centre());
        final double mid = (0.5 * a + 0.5 * b - centre) * scale;
        final double half = (0.5 * b - 0.5 * a) * scale;
        final double decay = Math.exp(-p.decayRate() / r * t);
        return g.mass() * decay * 0.5 * ErrorFunctions.erfDifferenceCentred(mid, half);
    }

    /** ∫ over [a, b] of a slug: the difference of two steps, in the form that does not
     * subtract two loaded sides. */
    private static double slug(InitialSlug s, double a, double b, double t) {
        final TransportParameters p = s.parameters();
        final double c0 = s.concentration();
        final double cellMiddle = 0.5 * a + 0.5 * b;
        final double slugMiddle = 0.5 * s.left() + 0.5 * s.right()
            + p.velocity() / p.retardation() * t;
        if (cellMiddle >= slugMiddle) {
            // ½erfc((x−m−B)/L) − ½erfc((x−m−A)/L): loaded to the left of each end
            return step(p, s.right(), c0, true, a, b, t) - step(p, s.left(), c0, true, a, b, t);
        }
        // the same as ½erfc(−(x−m−A)/L) − ½erfc(−(x−m−B)/L)
        return step(p, s.left(), c0, false, a, b, t) - step(p, s.right(), c0, false, a, b, t);
    }

    /**
     * ∫ over [a, b] of C₀·E·½erfc(±(x − m)/L), + when the left side is loaded.
     */
    private static double step(TransportParameters p, double x0, double c0, boolean left,
                               double a, double b, double t) {
        final double r = p.retardation();
        final double centre = Math.fma(p.velocity() / r, t, x0);
        if (t == 0) {
            // exact overlap of [a, b] with the loaded side
            final double loaded = left ? Math.min(b, x0) - a : b - Math.max(a, x0);
            return c0 * Math.max(0.0, loaded);
        }
        final double length = Math.sqrt(4 * p.dispersion() * t / r);
        final double decay = Math.exp(-p.decayRate() / r * t);
        final double ua = (a - centre) / length;
        final double ub = (b - centre) / length;
        // ½erfc(−u) over [u_a, u_b] is ½erfc(w) over [−u_b, −u_a]
        final double unit = left ? halfErfcIntegral(ua, ub, b - a, length)
            : halfErfcIntegral(-ub, -ua, b - a, length);
        return c0 * decay * unit;
    }

    /**
     * ∫ ½erfc(u) du over [lo, hi], multiplied by the length L (so it is ∫ dx over the cell);
     * width is the cell's width b − a = L·(hi − lo).
     */
    private static double halfErfcIntegral(double lo, double hi, double width, double length) {
        if (lo >= 0) {
            return 0.5 * length * (ierfc(lo) - ierfc(hi));
        }
        if (hi <= 0) {
            // ½erfc(u) = 1 − ½erfc(−u)
            return width - 0.5 * length * (ierfc(-hi) - ierfc(-lo));
        }
        return (-lo * length - 0.5 * length * (ierfc(0) - ierfc(-lo)))
            + 0.5 * length * (ierfc(0) - ierfc(hi));
    }

    /** ierfc(u) = e^{−u²}/√π − u·erfc(u) for u ≥ 0, as −½e^{−u²}·erfcx′(u) (no cancellation). */
    private static double ierfc(double u) {
        if (u == Double.POSITIVE_INFINITY) {
            return 0.0;
        }
        if (u == 0) {
            return 1 / SQRT_PI;
        }
        return -0.5 * Exponentials.expMinusSquare(u) * ErrorFunctions.erfcxDerivative(u);
    }

    /** Neumaier's compensated sum (Neumaier 1974, ZAMM 54, 39–51). */
    static final class Sum {
        private double sum;
        private double compensation;

        void add(double x) {
            final double t = sum + x;
            if (Math.abs(sum) >= Math.abs(x)) {
                compensation += (sum - t) + x;
            } else {
                compensation += (x - t) + sum;
            }
            sum = t;
        }

        double value() {
            return sum + compensation;
        }
    }
}
