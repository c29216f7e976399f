package org.advecta.solution;

import org.advecta.internal.GaussLegendre;
import org.advecta.internal.ScaledExp;
import org.advecta.special.ErrorFunctions;

/**
 * Integrals of φ(s) = 1/√π − s·erfcx(s) = −erfcx′(s)/2 &gt; 0, the building block that makes
 * the inlet solutions and their complements sums of positive terms.
 *
 * <p>Since ∫_a^b φ(s) ds = (erfcx(a) − erfcx(b))/2, differences of erfcx (and of the
 * erfc products of the inlet solutions) become integrals of a positive function. Over a wide
 * interval the difference itself cannot cancel badly; over a narrow one the 10-point
 * Gauss–Legendre rule is applied to φ, which is smooth on the scale max(1, s) (its nearest
 * complex singularity-free growth is on that scale), so the rule is exact to rounding when
 * the half-width is at most a quarter of that scale.
 */
final class ErfcxIntegrals {

    private ErfcxIntegrals() {
    }

    /** φ(s) = −erfcx′(s)/2. */
    static double phi(double s) {
        return -0.5 * ErrorFunctions.erfcxDerivative(s);
    }

    /** ψ(s) = erfcx″(s)/2 = −φ′(s). */
    static double psi(double s) {
        return 0.5 * ErrorFunctions.erfcxSecondDerivative(s);
    }

    /**
     * Whether [m − h, m + h] is narrow enough for the quadrature of φ: φ varies on the scale
     * max(1, m) for m ≥ −1.
     */
    static boolean narrow(double m, double h) {
        return m >= -1 && h <= 0.25 * Math.max(1, m);
    }

    /** ∫ φ over [m − h, m + h] by 10-point Gauss–Legendre (for narrow intervals). */
    static double integralOfPhi(double m, double h) {
        return GaussLegendre.integrate(ErfcxIntegrals::phi, m, h);
    }

    /**
     * ∫ φ over [m − h, m + h] = (erfcx(m − h) − erfcx(m + h))/2: by quadrature where the
     * interval is narrow, as the difference where it is wide (and cannot cancel badly).
     */
    static double integralOfPhiAnyWidth(double m, double h) {
        return narrow(m, h) ? integralOfPhi(m, h)
            : 0.5 * (ErrorFunctions.erfcx(m - h) - ErrorFunctions.erfcx(m + h));
    }

    /**
     * J(a, b) = ½[erfc(a) − exp(−a²)·erfcx(b)] = exp(−a²)·∫_a^b φ(s) ds ≥ 0 for a = m − h ≤
     * b = m + h, without cancellation, from the centre and half-width, which callers form
     * more accurately than the ends (a half-width x/L far below the centre vt/(RL) would lose
     * its digits in m ± h).
     */
    static double jCentred(double m, double h) {
        final double a = m - h;
        final double b = m + h;
        if (narrow(m, h)) {
            return ScaledExp.value(integralOfPhi(m, h), 0.0, a);
        }
        // wide: erfcx(a)/erfcx(b) is bounded away from 1, the difference loses little
        return 0.5 * (ErrorFunctions.erfc(a)
            - ScaledExp.value(ErrorFunctions.erfcx(b), 0.0, a));
    }

    /** ∫ ψ over [m − h, m + h] by 10-point Gauss–Legendre (for narrow intervals). */
    static double integralOfPsi(double m, double h) {
        return GaussLegendre.integrate(ErfcxIntegrals::psi, m, h);
    }

    /**
     * The mean of ψ = −φ′ over the interval between p and q (either order), =
     * (φ(lo) − φ(hi))/(hi − lo), and ψ(p) when p = q.
     */
    static double meanOfPsi(double p, double q) {
        final double lo = Math.min(p, q);
        final double hi = Math.max(p, q);
        final double m = 0.5 * lo + 0.5 * hi;
        final double h = 0.5 * hi - 0.5 * lo;
        if (h == 0) {
            return psi(lo);
        }
        if (narrow(m, h)) {
            return integralOfPsi(m, h) / (2 * h);
        }
        return (phi(lo) - phi(hi)) / (2 * h);
    }

    /**
     * exp(e)·J(m − h, m + h) for h ≥ 0, without overflow of exp(e) or underflow of J first:
     * exp(e)·J = exp(e − a²)·∫_a^b φ, and ∫_a^b φ = (erfcx(a) − erfcx(b))/2 is an ordinary
     * number unless a &lt; −26 (where erfcx(a) overflows but J ≈ erfc(a)/2 ≈ 1).
     */
    static double expTimesJ(double e, double m, double h) {
        final double a = m - h;
        if (a < ERFCX_OVERFLOW) {
            return Math.exp(e) * jCentred(m, h);
        }
        return ScaledExp.value(integralOfPhiAnyWidth(m, h), e, a);
    }

    /** Below this, erfcx overflows (2·exp(26.6²) &gt; MAX_VALUE); −26 leaves a margin. */
    static final double ERFCX_OVERFLOW = -26;

    /**
     * The mean of φ over the interval between p and q (either order), =
     * (erfcx(lo) − erfcx(hi)) / (2(hi − lo)), and φ(p) when p = q.
     */
    static double meanOfPhi(double p, double q) {
        final double lo = Math.min(p, q);
        final double hi = Math.max(p, q);
        final double m = 0.5 * lo + 0.5 * hi;
        final double h = 0.5 * hi - 0.5 * lo;
        if (h == 0) {
            return phi(lo);
        }
        if (narrow(m, h)) {
            return integralOfPhi(m, h) / (2 * h);
        }
        return (ErrorFunctions.erfcx(lo) - ErrorFunctions.erfcx(hi)) / (4 * h);
    }
}
