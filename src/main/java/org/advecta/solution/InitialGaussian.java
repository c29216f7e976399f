package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.internal.ScaledExp;
import org.advecta.internal.Spread;
import org.advecta.transport.TransportParameters;

/**
 * A Gaussian plume of mass M (per unit cross-section and mobile-phase capacity), centre x_c and
 * standard deviation s₀ at t = 0, on the infinite line.
 *
 * <pre>
 * c(x, 0) = M / (s₀√(2π)) · exp(−(x − x_c)² / (2s₀²))
 * c(x, t) = M · exp(−μt/R) / √(2πS²) · exp(−(x − x_c − vt/R)² / (2S²)),   S² = s₀² + 2Dt/R
 * </pre>
 *
 * <p>Gaussians convolve into a Gaussian whose variance is the sum (Crank 1975, §2.2); the
 * variance 2S² is formed in double-double, so the exponent carries a few units of rounding
 * at most.
 *
 * <p>Accuracy: value and gradient within max(16, 2κ) ULP of the exact result wherever it is a
 * normal double (κ with respect to x, t, x_c, s₀, M, v, D, R, μ).
 */
public final class InitialGaussian extends AbstractSolution1D {

    private final double centre;
    private final double width;
    private final double mass;

    private InitialGaussian(TransportParameters parameters, double centre, double width,
                            double mass) {
        super(parameters, Domain.LINE);
        this.centre = Checks.finite("xc", centre);
        this.width = Checks.positive("s0", width);
        this.mass = Checks.finite("mass", mass);
    }

    /**
     * Returns the solution for a Gaussian initial plume.
     *
     * @param parameters v, D, R, μ
     * @param centre x_c, finite
     * @param width s₀, the standard deviation, finite and &gt; 0
     * @param mass M, the integral of c(x, 0), finite
     * @return the solution
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static InitialGaussian of(TransportParameters parameters, double centre,
                                     double width, double mass) {
        return new InitialGaussian(parameters, centre, width, mass);
    }

    /**
     * Returns the centre x_c of the plume at t = 0.
     *
     * @return x_c
     */
    public double centre() {
        return centre;
    }

    /**
     * Returns the standard deviation s₀ of the plume at t = 0.
     *
     * @return s₀
     */
    public double width() {
        return width;
    }

    /**
     * Returns the mass M, the integral of c(x, 0).
     *
     * @return M
     */
    public double mass() {
        return mass;
    }

    @Override
    double valueAt(double x, double t) {
        return valueAt(x, t, spread(t));
    }

    @Override
    Spread spreadAt(double t) {
        return spread(t);
    }

    @Override
    double valueAt(double x, double t, Spread s) {
        final double xi = x - Math.fma(drift, t, centre);
        final double qh = s.exponentHigh(xi);
        return mass * ScaledExp.valueOfSplit(s.norm, decayExponent(t), qh, s.exponentLow(xi, qh));
    }

    @Override
    double gradientAt(double x, double t) {
        // ∂c/∂x = −ξ/S² · c = −2ξ · (1/(2S²)) · c
        final Spread s = spread(t);
        final double xi = x - Math.fma(drift, t, centre);
        final double qh = s.exponentHigh(xi);
        // the factor −2ξ/(2S²)·M goes into the multiplier: no subnormal c is formed first
        return ScaledExp.valueOfSplit(s.norm * (-2 * xi * s.high * mass), decayExponent(t), qh,
            s.exponentLow(xi, qh));
    }

    @Override
    double initialValue(double x) {
        return valueWithTwiceVariance(x, 2 * width * width, Math.fma(2 * width, width,
            -(2 * width * width)));
    }

    @Override
    double initialGradient(double x) {
        final double twice = 2 * width * width;
        final Spread s = Spread.ofTwiceVariance(twice, Math.fma(2 * width, width, -twice));
        final double xi = x - centre;
        final double qh = s.exponentHigh(xi);
        return ScaledExp.valueOfSplit(s.norm * (-2 * xi * s.high * mass), 0.0, qh,
            s.exponentLow(xi, qh));
    }

    private double valueWithTwiceVariance(double x, double hi, double lo) {
        final Spread s = Spread.ofTwiceVariance(hi, lo);
        final double xi = x - centre;
        final double qh = s.exponentHigh(xi);
        return mass * ScaledExp.valueOfSplit(s.norm, 0.0, qh, s.exponentLow(xi, qh));
    }

    /** The spread of variance S² = s₀² + 2Dt/R, with 2S² in double-double. */
    private Spread spread(double t) {
        // 2s₀² exactly as (w2, w2Low); 4Dt exactly as (p, pLow), then divided by R.
        final double w2 = 2 * width * width;
        final double w2Low = Math.fma(2 * width, width, -w2);
        final double p = 4 * dispersion * t;
        final double pLow = Math.fma(4 * dispersion, t, -p);
        final double q = p / retardation;
        final double qLow = (Math.fma(-q, retardation, p) + pLow) / retardation;
        // two-sum of the leading parts, then the trailing parts
        final double sum = w2 + q;
        final double bv = sum - w2;
        final double err = (w2 - (sum - bv)) + (q - bv);
        final double hi = sum + (err + w2Low + qLow);
        final double lo = (err + w2Low + qLow) - (hi - sum);
        return Spread.ofTwiceVariance(hi, lo);
    }
}
