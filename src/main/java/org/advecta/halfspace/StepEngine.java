package org.advecta.halfspace;

import org.advecta.internal.ScaledExp;
import org.advecta.internal.Spread;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.ExpErfc;
import org.advecta.transport.TransportParameters;

/**
 * The half-line step S(x, t; a) = ∫_a^∞ K(x, t; ξ) dξ (unit concentration on x &gt; a at
 * t = 0) for both walls, and its x-derivative, as sums of non-negative terms. Notation:
 * L = √(4Dt/R), E = e^{−μt/R}, P = vt/(RL), α = (a − x + vt/R)/L, β = (x + a + vt/R)/L,
 * ρ = (x + a)/L, k = xaR/(Dt), φ(s) = 1/√π − s·erfcx(s), ψ(s) = erfcx(s) − 2sφ(s) &gt; 0.
 *
 * <pre>
 * absorbing:   S = E·[½erfc(α) − ½e^{vx/D}·erfc(β)]                      (published form)
 *                = E·J(α, β) + ½(1 − e^{−k})·E·e^{vx/D + k}·erfc(β)    (both ≥ 0)
 * zero flux:   S = E·[½erfc(α) + ½e^{vx/D}erfc(β) − (vL/(2D))·e^{vx/D}·ierfc(β)]
 *                = S_absorbing + E·e^{−α² − k}·[ψ(β) + 2ρφ(β)]          (v ≥ 0)
 *                = ½E·erfc(α) + E·e^{vx/D}·[½erfc(β) + 2|P|·ierfc(β)]   (v &lt; 0)
 * </pre>
 * J(α, β) = ½[erfc(α) − e^{−α²}erfcx(β)] as in {@link Phi#expTimesJ}, and
 * ierfc(s) = ∫_s^∞ erfc = e^{−s²}φ(s). The identities used: β² − α² = vx/D + k, and
 * erfcx(β) − 2Pφ(β) = ψ(β) + 2(β − P)φ(β) with β − P = ρ ≥ 0.
 */
final class StepEngine {

    private static final double SQRT_PI = Math.sqrt(Math.PI);

    private final Wall wall;
    private final double v;
    private final double d;
    private final double r;
    private final double mu;

    StepEngine(TransportParameters p, Wall wall) {
        this.wall = wall;
        this.v = p.velocity();
        this.d = p.dispersion();
        this.r = p.retardation();
        this.mu = p.decayRate();
    }

    /** The per-point quantities. */
    private final class Point {
        final double alpha;
        final double beta;
        final double p;
        final double rho;
        final double k;
        final double fourMH;
        final double invL;
        final double centre;
        final double halfWidth;
        final double dh;
        final double vxOverD;

        Point(double x, double t, double a) {
            final Spread s = Spread.of(d, r, t);
            final double drift = v / r * t;
            this.alpha = s.scaled(Math.fma(v / r, t, a - x));
            this.beta = s.scaled(Math.fma(v / r, t, x + a));
            this.p = s.scaled(drift);
            this.rho = s.scaled(x + a);
            this.k = 4 * x * a * s.high;
            // β² − α² = 4x(a + vt/R)·R/(4Dt)
            this.fourMH = 4 * x * Math.fma(v / r, t, a) * s.high;
            this.invL = s.inverseLength();
            this.centre = s.scaled(Math.fma(v / r, t, a));
            this.halfWidth = s.scaled(x);
            this.dh = -mu / r * t;
            this.vxOverD = v * x / d;
        }
    }

    /** S(x, t; a) for t &gt; 0. */
    double value(double x, double t, double a) {
        final Point q = new Point(x, t, a);
        if (wall == Wall.ZERO_FLUX && v < 0) {
            final double absP = -q.p;
            final double tail;
            if (q.beta >= 0) {
                tail = ScaledExp.value(0.5 * ErrorFunctions.erfcx(q.beta)
                    + 2 * absP * Phi.phi(q.beta), q.vxOverD + q.dh, q.beta);
            } else {
                final double erfc = ErrorFunctions.erfc(q.beta);
                final double ierfc = Math.exp(-q.beta * q.beta) / SQRT_PI - q.beta * erfc;
                tail = ScaledExp.value(0.5 * erfc + 2 * absP * ierfc, q.vxOverD + q.dh, 0.0);
            }
            return 0.5 * ExpErfc.value(q.dh, q.alpha) + tail;
        }
        // centre (a + vt/R)/L and half-width x/L of [α, β], formed directly: β − α would lose
        // the digits of a half-width far below the centre
        final double m = q.centre;
        final double h = q.halfWidth;
        final double absorbing = Phi.expTimesJ(q.dh, m, h, q.fourMH)
            + 0.5 * -Math.expm1(-q.k) * ExpErfc.value(q.fourMH + q.dh, q.beta);
        if (wall == Wall.ABSORBING) {
            return absorbing;
        }
        // zero flux, v ≥ 0 (β ≥ 0)
        final double extra = ErfcxPsi.psi(q.beta) + 2 * q.rho * Phi.phi(q.beta);
        return absorbing + ScaledExp.value(extra, q.dh - q.k, q.alpha);
    }

    /**
     * ∂S/∂x for t &gt; 0:
     * <pre>
     * absorbing, v ≥ 0:  (E e^{−α²}/L)·[(1 − e^{−k})/√π + 2e^{−k}(φ(β) + ρ·erfcx(β))]
     * absorbing, v &lt; 0:  (E e^{−α²}/(L√π))·(1 + e^{−k}) + (|v|/(2D))·E·e^{vx/D}·erfc(β)
     * zero flux, v ≥ 0:  (E e^{−α²}/L)·[(1 − e^{−k})/√π + 4P·e^{−k}(ψ(β) + 2ρφ(β))]
     * zero flux, v &lt; 0:  (E e^{−α²}/(L√π))·(1 − e^{−k})
     *                    − (|v|/D)·E·e^{vx/D}·[erfc(β) + 2|P|·ierfc(β)]
     * </pre>
     */
    double gradient(double x, double t, double a) {
        final Point q = new Point(x, t, a);
        final double em = -Math.expm1(-q.k);
        final double e = Math.exp(-q.k);
        if (v >= 0) {
            final double inner = wall == Wall.ABSORBING
                ? 2 * e * (Phi.phi(q.beta) + q.rho * ErrorFunctions.erfcx(q.beta))
                : 4 * q.p * e * (ErfcxPsi.psi(q.beta) + 2 * q.rho * Phi.phi(q.beta));
            return ScaledExp.value(q.invL * (em / SQRT_PI + inner), q.dh, q.alpha);
        }
        if (wall == Wall.ABSORBING) {
            return ScaledExp.value(q.invL * (1 + e) / SQRT_PI, q.dh, q.alpha)
                + -v / (2 * d) * ExpErfc.value(q.vxOverD + q.dh, q.beta);
        }
        final double absP = -q.p;
        final double layer;
        if (q.beta >= 0) {
            layer = ScaledExp.value(ErrorFunctions.erfcx(q.beta) + 2 * absP * Phi.phi(q.beta),
                q.vxOverD + q.dh, q.beta);
        } else {
            final double erfc = ErrorFunctions.erfc(q.beta);
            final double ierfc = Math.exp(-q.beta * q.beta) / SQRT_PI - q.beta * erfc;
            layer = ScaledExp.value(erfc + 2 * absP * ierfc, q.vxOverD + q.dh, 0.0);
        }
        return ScaledExp.value(q.invL * em / SQRT_PI, q.dh, q.alpha) + v / d * layer;
    }

    /** ψ(s) = erfcx″(s)/2 &gt; 0. */
    static final class ErfcxPsi {
        private ErfcxPsi() {
        }

        static double psi(double s) {
            return 0.5 * ErrorFunctions.erfcxSecondDerivative(s);
        }
    }
}
