package org.advecta.verify;

import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * Roache's grid convergence index (GCI) from a quantity φ computed on three grids, with the
 * apparent order p and the Richardson-extrapolated value, following the procedure of Celik,
 * Ghia, Roache, Freitas, Coleman &amp; Raad (2008), "Procedure for estimation and reporting of
 * uncertainty due to discretization in CFD applications", J. Fluids Eng. 130(7), 078001.
 * Immutable and thread-safe.
 *
 * <p>With h₁ &lt; h₂ &lt; h₃ (grid 1 the finest), r₂₁ = h₂/h₁, r₃₂ = h₃/h₂,
 * ε₂₁ = φ₂ − φ₁, ε₃₂ = φ₃ − φ₂ and s = sign(ε₃₂/ε₂₁) (Celik et al. 2008, eqs. 3–7):
 * <pre>
 * p      = |ln|ε₃₂/ε₂₁| + q(p)| / ln r₂₁,   q(p) = ln((r₂₁^p − s)/(r₃₂^p − s))
 * φ_ext  = (r₂₁^p·φ₁ − φ₂)/(r₂₁^p − 1)                       (Richardson extrapolation)
 * e_a    = |(φ₁ − φ₂)/φ₁|,   e_ext = |(φ_ext − φ₁)/φ_ext|
 * GCI    = F_s·e_a/(r₂₁^p − 1)                                 (Roache 1994, J. Fluids Eng.
 *                                                                116(3), 405–413)
 * </pre>
 * solved for p by fixed-point iteration from q = 0 (exact in one step when r₂₁ = r₃₂). The
 * safety factor F_s is 1.25 for three or more grids (Roache 1998; Celik et al. 2008); s = −1
 * means oscillatory convergence ({@link #isOscillatory()}), which the procedure reports but
 * which makes p and the GCI less reliable.
 *
 * <p>Accuracy: p to 1e-12 (the iteration's stopping rule); the derived values to rounding.
 */
public final class GridConvergenceIndex {

    /** The safety factor for studies on three or more grids. */
    public static final double DEFAULT_SAFETY_FACTOR = 1.25;
    private static final int MAX_ITERATIONS = 1000;
    private static final double ORDER_TOLERANCE = 1e-12;

    private final double r21;
    private final double r32;
    private final double order;
    private final double extrapolated;
    private final double approximateError;
    private final double extrapolatedError;
    private final double gci;
    private final double safetyFactor;
    private final boolean oscillatory;

    private GridConvergenceIndex(double r21, double r32, double order, double extrapolated,
                                 double approximateError, double extrapolatedError,
                                 double gci, double safetyFactor, boolean oscillatory) {
        this.r21 = r21;
        this.r32 = r32;
        this.order = order;
        this.extrapolated = extrapolated;
        this.approximateError = approximateError;
        this.extrapolatedError = extrapolatedError;
        this.gci = gci;
        this.safetyFactor = safetyFactor;
        this.oscillatory = oscillatory;
    }

    /**
     * Returns the index with the default safety factor 1.25.
     *
     * @param h1 the finest grid's spacing, finite and &gt; 0
     * @param h2 the middle grid's spacing, finite and &gt; h1
     * @param h3 the coarsest grid's spacing, finite and &gt; h2
     * @param phi1 φ on the finest grid, finite and ≠ 0
     * @param phi2 φ on the middle grid, finite and ≠ φ₁
     * @param phi3 φ on the coarsest grid, finite and ≠ φ₂
     * @return the index, order and extrapolated value
     * @throws IllegalArgumentException if an argument is invalid, or no order satisfies the
     *     equation (p would not be positive and finite)
     */
    public static GridConvergenceIndex of(double h1, double h2, double h3, double phi1,
                                          double phi2, double phi3) {
        return of(h1, h2, h3, phi1, phi2, phi3, DEFAULT_SAFETY_FACTOR);
    }

    /**
     * Returns the index with the given safety factor.
     *
     * @param h1 the finest grid's spacing, finite and &gt; 0
     * @param h2 the middle grid's spacing, finite and &gt; h1
     * @param h3 the coarsest grid's spacing, finite and &gt; h2
     * @param phi1 φ on the finest grid, finite and ≠ 0
     * @param phi2 φ on the middle grid, finite and ≠ φ₁
     * @param phi3 φ on the coarsest grid, finite and ≠ φ₂
     * @param safetyFactor F_s, finite and ≥ 1
     * @return the index, order and extrapolated value
     * @throws IllegalArgumentException if an argument is invalid, or no order satisfies the
     *     equation (p would not be positive and finite)
     */
    public static GridConvergenceIndex of(double h1, double h2, double h3, double phi1,
                                          double phi2, double phi3, double safetyFactor) {
        Checks.positive("h1", h1);
        Checks.positive("h2", h2);
        Checks.positive("h3", h3);
        if (!(h2 > h1)) {
            throw Checks.fail("h2", h2, "must be > h1 = " + h1 + " (grid 1 is the finest)");
        }
        if (!(h3 > h2)) {
            throw Checks.fail("h3", h3, "must be > h2 = " + h2);
        }
        Checks.finite("phi1", phi1);
        Checks.finite("phi2", phi2);
        Checks.finite("phi3", phi3);
        Checks.atLeast("safetyFactor", safetyFactor, 1.0);
        if (phi1 == 0) {
            throw Checks.fail("phi1", phi1, "must be != 0 (relative errors divide by it)");
        }
        final double e21 = phi2 - phi1;
        final double e32 = phi3 - phi2;
        if (e21 == 0) {
            throw Checks.fail("phi2", phi2, "must differ from phi1 (no order is observable)");
        }
        if (e32 == 0) {
            throw Checks.fail("phi3", phi3, "must differ from phi2 (no order is observable)");
        }
        final double r21 = h2 / h1;
        final double r32 = h3 / h2;
        final double s = Math.signum(e32 / e21);
        final double logRatio = Math.log(Math.abs(e32 / e21));
        final double lnR21 = Math.log(r21);
        double p = Math.abs(logRatio) / lnR21;
        boolean converged = false;
        for (int i = 0; i < MAX_ITERATIONS && p > 0 && p < Double.POSITIVE_INFINITY; i++) {
            final double q = Math.log((Math.pow(r21, p) - s) / (Math.pow(r32, p) - s));
            final double next = Math.abs(logRatio + q) / lnR21;
            if (Math.abs(next - p) <= ORDER_TOLERANCE * Math.max(1.0, p)) {
                p = next;
                converged = true;
                break;
            }
            p = next;
        }
        if (!converged || !(p > 0 && p < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "no apparent order: the fixed-point iteration for p did not converge to a"
                    + " positive value (phi = %s, %s, %s; r21 = %s, r32 = %s)",
                phi1, phi2, phi3, r21, r32));
        }
        final double rp = Math.pow(r21, p);
        final double ext = (rp * phi1 - phi2) / (rp - 1);
        final double ea = Math.abs(e21 / phi1);
        final double eExt = Math.abs((ext - phi1) / ext);
        return new GridConvergenceIndex(r21, r32, p, ext, ea, eExt, safetyFactor * ea / (rp - 1),
            safetyFactor, s < 0);
    }

    /**
     * Returns the apparent order p.
     *
     * @return p &gt; 0
     */
    public double order() {
        return order;
    }

    /**
     * Returns the Richardson-extrapolated value φ_ext = (r₂₁^p·φ₁ − φ₂)/(r₂₁^p − 1).
     *
     * @return φ_ext
     */
    public double extrapolated() {
        return extrapolated;
    }

    /**
     * Returns the approximate relative error e_a = |(φ₁ − φ₂)/φ₁|.
     *
     * @return e_a (a fraction, not per cent)
     */
    public double approximateRelativeError() {
        return approximateError;
    }

    /**
     * Returns the extrapolated relative error e_ext = |(φ_ext − φ₁)/φ_ext|.
     *
     * @return e_ext (a fraction)
     */
    public double extrapolatedRelativeError() {
        return extrapolatedError;
    }

    /**
     * Returns the fine-grid convergence index GCI = F_s·e_a/(r₂₁^p − 1).
     *
     * @return the GCI (a fraction)
     */
    public double fineGridIndex() {
        return gci;
    }

    /**
     * Returns the safety factor F_s used.
     *
     * @return F_s
     */
    public double safetyFactor() {
        return safetyFactor;
    }

    /**
     * Returns r₂₁ = h₂/h₁.
     *
     * @return the fine refinement ratio
     */
    public double fineRatio() {
        return r21;
    }

    /**
     * Returns r₃₂ = h₃/h₂.
     *
     * @return the coarse refinement ratio
     */
    public double coarseRatio() {
        return r32;
    }

    /**
     * Returns whether the convergence is oscillatory (ε₃₂/ε₂₁ &lt; 0).
     *
     * @return true if the differences change sign
     */
    public boolean isOscillatory() {
        return oscillatory;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT,
            "GridConvergenceIndex[p=%s, extrapolated=%s, ea=%s, eext=%s, GCI=%s, Fs=%s%s]",
            order, extrapolated, approximateError, extrapolatedError, gci, safetyFactor,
            oscillatory ? ", oscillatory" : "");
    }
}
