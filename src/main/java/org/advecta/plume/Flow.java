package org.advecta.plume;

import org.advecta.internal.ScaledExp;
import org.advecta.special.ExpErfc;
import org.advecta.special.ErrorFunctions;
import org.advecta.transport.TransportParameters;

/**
 * The per-medium constants shared by every continuous source, and the cross-section integrated
 * (one-dimensional) solution that gives the mass flux through a plane x = const.
 *
 * <p>With U = √(v² + 4μD_L) and the transverse coordinates stretched to the longitudinal
 * dispersion (y' = y√(D_L/D_T), z' = z√(D_L/D_V)), every solution carries the factor
 * exp(s) with
 * <pre>
 * s = (x v − r U) / (2 D_L) = −(|v| (r − x·sgn v) + r (U − |v|)) / (2 D_L) ≤ 0,
 *     r − x·sgn v = (y'² + z'²) / (r + x·sgn v)  when x·sgn v &gt; 0,
 *     U − |v| = 4 μ D_L / (U + |v|),
 * </pre>
 * written as a sum of non-negative terms, so that s has no cancellation just downstream on
 * the centreline (common practice for such exponents; the rewriting is exact algebra).
 */
final class Flow {

    final double velocity;
    final double dL;
    final double dT;
    final double dV;
    final double retardation;
    final double decay;
    /** U = √(v² + 4μD_L). */
    final double u;
    /** U − |v|, without cancellation. */
    final double uMinusSpeed;
    /** √(D_L/D_T), √(D_L/D_V): the transverse stretch factors. */
    final double stretchY;
    final double stretchZ;
    /** 1 + v/U and 1 − v/U, each without cancellation (both 1 when U = 0). */
    final double onePlus;
    final double oneMinus;

    Flow(TransportParameters p) {
        if (p == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        this.velocity = p.velocity();
        this.dL = p.dispersion();
        this.dT = p.transverseDispersion();
        this.dV = p.verticalDispersion();
        this.retardation = p.retardation();
        this.decay = p.decayRate();
        final double speed = Math.abs(velocity);
        this.u = Math.hypot(velocity, 2 * Math.sqrt(decay * dL));
        this.uMinusSpeed = speed + u == 0 ? 0.0 : 4 * decay * dL / (u + speed);
        this.stretchY = Math.sqrt(dL / dT);
        this.stretchZ = Math.sqrt(dL / dV);
        if (u == 0) {
            this.onePlus = 1.0;
            this.oneMinus = 1.0;
        } else if (velocity >= 0) {
            this.onePlus = 1 + velocity / u;
            this.oneMinus = uMinusSpeed / u;
        } else {
            this.onePlus = uMinusSpeed / u;
            this.oneMinus = 1 - velocity / u;
        }
    }

    /**
     * Returns s = (dx·v − rU)/(2D_L) without cancellation.
     *
     * @param dx offset along the flow
     * @param rho2 squared stretched transverse offset, y'² + z'²
     * @param r the stretched distance √(dx² + rho2)
     * @return s ≤ 0
     */
    double exponent(double dx, double rho2, double r) {
        final double xs = velocity >= 0 ? dx : -dx;
        final double rMinus = xs > 0 ? rho2 / (r + xs) : r - xs;
        return -(Math.abs(velocity) * rMinus + r * uMinusSpeed) / (2 * dL);
    }

    /**
     * Returns the pair of erfc terms exp(s)·erfc(A) + exp(s − A²)·erfcx(B) with
     * A = (R r − U t)/(2√(D_L R t)), B = (R r + U t)/(2√(D_L R t)), weighted by c1 and c2:
     * the time integral of the kernel's exp(−a/τ − bτ) τ^(−3/2) and τ^(−1/2) forms
     * (exp(rU/D_L)·erfc(B) = exp(−A²)·erfcx(B) since B² − A² = rU/D_L).
     *
     * @param s the exponent s
     * @param r the stretched distance, &gt; 0
     * @param t the time, &gt; 0 and finite
     * @param c1 weight of the first term
     * @param c2 weight of the second term
     * @return c1·exp(s)·erfc(A) + c2·exp(s − A²)·erfcx(B)
     */
    double erfcPair(double s, double r, double t, double c1, double c2) {
        final double root = 2 * Math.sqrt(dL * retardation) * Math.sqrt(t);
        final double rr = retardation * r;
        final double ut = u * t;
        final double a = (rr - ut) / root;
        final double b = (rr + ut) / root;
        final double first = c1 == 0 ? 0.0 : c1 * ExpErfc.value(s, a);
        final double second = c2 == 0 ? 0.0 : ScaledExp.value(c2 * ErrorFunctions.erfcx(b), s, a);
        return first + second;
    }

    /**
     * Returns the mass flux ∫∫ (v c − D_L ∂c/∂x) dy dz through the plane at offset dx from a
     * source of unit rate switched on at t = 0: the flux of the one-dimensional continuous
     * source, F = ±(1/4)[c₁ e^s erfc(A) + c₂ e^(s − A²) erfcx(B)] with r = |dx|.
     *
     * @param dx offset of the plane from the source, nonzero and finite
     * @param t time, ≥ 0, finite or +∞ (steady state)
     * @return the flux (negative upstream of the source where transport runs upstream)
     */
    double sectionFlux(double dx, double t) {
        final double r = Math.abs(dx);
        final double s = exponent(dx, 0.0, r);
        final double c1 = dx > 0 ? onePlus : oneMinus;
        final double c2 = dx > 0 ? oneMinus : onePlus;
        final double f;
        if (t == Double.POSITIVE_INFINITY) {
            f = 0.5 * c1 * Math.exp(s);
        } else if (t == 0) {
            f = 0.0;
        } else {
            f = 0.25 * erfcPair(s, r, t, c1, c2);
        }
        return dx > 0 ? f : -f;
    }
}
