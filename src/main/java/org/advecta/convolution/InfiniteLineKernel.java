package org.advecta.convolution;

import org.advecta.internal.Checks;
import org.advecta.internal.Spread;
import org.advecta.solution.Domain;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.Exponentials;
import org.advecta.transport.TransportParameters;

/**
 * The free-space kernel of the whole line as a {@link ConvolutionKernel}, with closed-form
 * segment integrals. Immutable and thread-safe.
 *
 * <pre>
 * G(x, ξ, t) = exp(−μt/R)/(L√π) · exp(−y²),   y = (x − vt/R − ξ)/L,   L = √(4Dt/R)
 * ∫ₐᵇ φ G dξ = exp(−μt/R) · [φ(a)·rising(m, h) + φ(b)·rising(−m, h)]   (φ linear on [a, b])
 * m = (x − vt/R − (a + b)/2)/L,   h = (b − a)/(2L)
 * </pre>
 *
 * <p>The kernel is that of {@link org.advecta.kernel.FreeSpaceKernel1D} (Carslaw &amp; Jaeger
 * 1959, §10.2). The weights rising(±m, h) are the integrals of the two hat-function halves
 * against exp(−y²)/√π, each of a non-negative integrand and evaluated without cancellation
 * (erfc and erfcx′ tail forms, or Gauss–Legendre on narrow segments); see the package
 * documentation. The x-derivative of a linear piece is, integrating by parts (∂G/∂x =
 * −∂G/∂ξ), φ(a)G(a) − φ(b)G(b) + φ′·∫ₐᵇ G dξ.
 *
 * <p><b>Accuracy.</b> Each segment integral is within 32 + 4κ units of 2⁻⁵³ of
 * |φ(a)|·rising(m, h) + |φ(b)|·rising(−m, h) times the decay (κ = 2|y|·(|x| + |vt/R| + |ξ|)/L
 * at the nearer end, the sensitivity to the positions), as measured against 40-digit
 * quadrature in the tests. Tails below and above are ½erfc within 4 ULP.
 *
 * <p><b>Time.</b> At t = 0, or when 4Dt/R is below 2⁻⁶⁰⁰, the snapshot is
 * {@link ConvolutionKernel.Snapshot#collapsed() collapsed}: the solution is the decayed data
 * at x − vt/R.
 */
public final class InfiniteLineKernel implements ConvolutionKernel {

    private final TransportParameters parameters;

    private InfiniteLineKernel(TransportParameters parameters) {
        this.parameters = parameters;
    }

    /**
     * Returns the free-space kernel for the given parameters.
     *
     * @param parameters v, D, R, μ
     * @return the kernel
     * @throws IllegalArgumentException if parameters is null
     */
    public static InfiniteLineKernel of(TransportParameters parameters) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        return new InfiniteLineKernel(parameters);
    }

    @Override
    public TransportParameters parameters() {
        return parameters;
    }

    @Override
    public Domain domain() {
        return Domain.LINE;
    }

    @Override
    public Frozen at(double t) {
        Checks.nonNegative("t", t);
        return new Frozen(parameters, t);
    }

    /**
     * The free-space kernel at one time. Besides the {@link ConvolutionKernel.Snapshot}
     * methods it exposes the scaled distances the grid path needs.
     */
    public static final class Frozen implements ConvolutionKernel.Snapshot {

        private final double driftHigh;
        private final double driftLow;
        private final double decay;
        private final double width;
        private final double invWidth;
        private final double norm;
        private final boolean collapsed;
        private final Spread spread;

        Frozen(TransportParameters p, double t) {
            final double[] d = Spread.centre(0.0, p.velocity(), p.retardation(), t);
            this.driftHigh = d[0];
            this.driftLow = d[1];
            this.decay = Math.exp(-p.decayRate() * t / p.retardation());
            if (t == 0) {
                this.spread = null;
                this.collapsed = true;
            } else {
                this.spread = Spread.of(p.dispersion(), p.retardation(), t);
                this.collapsed = spread.collapsed;
            }
            this.invWidth = collapsed ? Double.POSITIVE_INFINITY : spread.inverseLength();
            this.width = collapsed ? 0.0 : 1 / invWidth;
            this.norm = collapsed ? Double.POSITIVE_INFINITY : invWidth * SegmentIntegrals.ONE_OVER_SQRT_PI;
        }

        @Override
        public boolean collapsed() {
            return collapsed;
        }

        @Override
        public boolean translationInvariant() {
            return true;
        }

        @Override
        public double decay() {
            return decay;
        }

        @Override
        public double origin(double x) {
            return (x - driftHigh) - driftLow;
        }

        @Override
        public double width() {
            return width;
        }

        /**
         * Returns (x − vt/R − ξ)/L with the drift carried in double-double.
         *
         * @param x position
         * @param xi source point
         * @return the scaled distance y
         */
        double scaled(double x, double xi) {
            return spread.scaled(distance(x, xi));
        }

        /**
         * Returns x − vt/R − ξ with one rounding: x − ξ and the subtraction of the drift
         * are carried exactly (two-sums), so an x near ξ far from the origin keeps its
         * small distance to full relative accuracy.
         */
        double distance(double x, double xi) {
            final double d = x - xi;
            final double e = twoSumError(x, -xi, d);
            final double d2 = d - driftHigh;
            final double e2 = twoSumError(d, -driftHigh, d2);
            return d2 + ((e + e2) - driftLow);
        }

        /**
         * Returns d/L for a distance d.
         *
         * @param d distance
         * @return d/L
         */
        double scale(double d) {
            return spread.scaled(d);
        }

        /**
         * Returns the drift vt/R rounded to a double.
         *
         * @return vt/R
         */
        double drift() {
            return driftHigh + driftLow;
        }

        /**
         * Returns the drift vt/R as a double-double: its leading part.
         *
         * @return leading part
         */
        double driftHigh() {
            return driftHigh;
        }

        /**
         * Returns the drift's trailing part.
         *
         * @return trailing part
         */
        double driftLow() {
            return driftLow;
        }

        @Override
        public double value(double x, double xi) {
            if (collapsed) {
                return origin(x) == xi ? Double.POSITIVE_INFINITY : 0.0;
            }
            return decay * norm * Exponentials.expMinusSquare(scaled(x, xi));
        }

        @Override
        public double valueAtOffset(double x, double s) {
            // X = x − vt/R exactly is o + r, o = origin(x) rounded, r its rounding error
            // (two two-differences); y = (X − ξ)/L = (r − s)/L
            final double t1 = x - driftHigh;
            final double e1 = twoSumError(x, -driftHigh, t1);
            final double o = t1 - driftLow;
            final double e2 = twoSumError(t1, -driftLow, o);
            if (collapsed) {
                return s == e1 + e2 ? Double.POSITIVE_INFINITY : 0.0;
            }
            return decay * norm * Exponentials.expMinusSquare(spread.scaled((e1 + e2) - s));
        }

        /** The exact error of the rounded sum s = a + b (Knuth's two-sum). */
        private static double twoSumError(double a, double b, double s) {
            final double bb = s - a;
            return (a - (s - bb)) + (b - bb);
        }

        @Override
        public double gradient(double x, double xi) {
            if (collapsed) {
                return 0.0;
            }
            final double y = scaled(x, xi);
            // ∂G/∂x = −2y/L · G
            return -2 * y * invWidth * (decay * norm * Exponentials.expMinusSquare(y));
        }

        @Override
        public double linear(double x, double a, double b, double fa, double fb) {
            if (!(b > a)) {
                return 0.0;
            }
            if (collapsed) {
                final double o = origin(x);
                if (o < a || o > b) {
                    return 0.0;
                }
                if (o == a) {
                    return 0.5 * decay * fa;
                }
                if (o == b) {
                    return 0.5 * decay * fb;
                }
                final double wb = (o - a) / (b - a);
                return decay * (fa * (1 - wb) + fb * wb);
            }
            // the ends in y each with one rounding, the centre from their mean
            final double da = distance(x, a);
            final double db = distance(x, b);
            final double hi = scale(da);
            final double lo = scale(db);
            final double m = scale(0.5 * da + 0.5 * db);
            final double h = scale(0.5 * b - 0.5 * a);
            return decay * weights(m, h, lo, hi, fa, fb);
        }

        /** fa·rising(m, h) + fb·rising(−m, h), the far-tail test first. */
        static double weights(double m, double h, double fa, double fb) {
            return weights(m, h, m - h, m + h, fa, fb);
        }

        /** As {@link #weights(double, double, double, double)} with the ends given. */
        static double weights(double m, double h, double lo, double hi, double fa, double fb) {
            if (Math.abs(m) - h >= SegmentIntegrals.FAR || !(h < HUGE_HALF_WIDTH)) {
                return Math.abs(m) - h >= SegmentIntegrals.FAR ? 0.0 : wide(m, h, fa, fb);
            }
            double r = 0;
            if (fa != 0) {
                r += fa * SegmentIntegrals.rising(m, h, lo, hi);
            }
            if (fb != 0) {
                r += fb * SegmentIntegrals.rising(-m, h, -hi, -lo);
            }
            return r;
        }

        /**
         * A segment more than 2⁵⁰⁰ kernel widths long (or of infinite scaled length): only
         * one end, if any, is within reach of the kernel, and the linear weight there is the
         * fraction of the segment from the other end.
         */
        private static double wide(double m, double h, double fa, double fb) {
            // y ∈ [m − h, m + h]; the mass near y = 0 sees φ(y) = fa at y = m + h, fb at m − h
            final double lo = Math.max(-SegmentIntegrals.FAR, m - h);
            final double hi = Math.min(SegmentIntegrals.FAR, m + h);
            if (!(lo < hi)) {
                return 0.0;
            }
            final double inside = 0.5 * ErrorFunctions.erfDifference(hi, lo);
            // relative position of y = 0 from the a-end: (m + h)/(2h) in [0, 1]
            final double fromA = 0.5 + 0.5 * (m / h);
            final double wa = Double.isFinite(fromA) ? 1 - fromA : 0.5;
            return inside * (fa * wa + fb * (1 - wa));
        }

        @Override
        public double linearGradient(double x, double a, double b, double fa, double fb) {
            if (!(b > a) || collapsed) {
                return 0.0;
            }
            final double da = distance(x, a);
            final double db = distance(x, b);
            final double m = scale(0.5 * da + 0.5 * db);
            final double h = scale(0.5 * b - 0.5 * a);
            final double ya = scale(da);
            final double yb = scale(db);
            // φ(a)G(a) − φ(b)G(b) + φ′·∫ₐᵇ G dξ  (∂G/∂x = −∂G/∂ξ, by parts)
            double r = decay * norm * (fa * Exponentials.expMinusSquare(ya)
                - fb * Exponentials.expMinusSquare(yb));
            if (fa != fb) {
                r += (fb - fa) / (b - a) * (decay * SegmentIntegrals.mass(m, h, yb, ya));
            }
            return r;
        }

        @Override
        public double below(double x, double a) {
            if (collapsed) {
                final double o = origin(x);
                return decay * (o < a ? 1.0 : o == a ? 0.5 : 0.0);
            }
            return decay * 0.5 * ErrorFunctions.erfc(scaled(x, a));
        }

        @Override
        public double above(double x, double b) {
            if (collapsed) {
                final double o = origin(x);
                return decay * (o > b ? 1.0 : o == b ? 0.5 : 0.0);
            }
            return decay * 0.5 * ErrorFunctions.erfc(-scaled(x, b));
        }

        @Override
        public double belowGradient(double x, double a) {
            return collapsed ? 0.0 : -value(x, a);
        }

        @Override
        public double aboveGradient(double x, double b) {
            return collapsed ? 0.0 : value(x, b);
        }
    }

    /** Half-widths beyond 2⁵⁰⁰ (segments far longer than the kernel) take the wide path. */
    static final double HUGE_HALF_WIDTH = 0x1.0p500;
}
