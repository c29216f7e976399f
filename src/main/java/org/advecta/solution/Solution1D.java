package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.transport.TransportParameters;

/**
 * A concentration field c(x, t) that solves {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c}
 * exactly. Implementations are immutable and thread-safe.
 *
 * <p>Every method validates its arguments: x must be finite (and ≥ 0 on the
 * {@link Domain#HALF_LINE}), t finite and ≥ 0; otherwise an {@link IllegalArgumentException}
 * names the argument and its value. At t = 0 a solution returns its initial (and boundary)
 * data as each family documents.
 *
 * <p><b>Arrays.</b> The batch methods read the i-th input before writing {@code out[i]}, so
 * {@code out} may be the input array itself; nothing is allocated per point.
 */
public interface Solution1D {

    /**
     * Returns the transport parameters.
     *
     * @return v, D, R, μ
     */
    TransportParameters parameters();

    /**
     * Returns where the solution is defined.
     *
     * @return the domain
     */
    Domain domain();

    /**
     * Returns the (resident) concentration c(x, t).
     *
     * @param x position
     * @param t time
     * @return c(x, t)
     * @throws IllegalArgumentException if x or t is invalid
     */
    double value(double x, double t);

    /**
     * Returns the gradient ∂c/∂x at (x, t).
     *
     * @param x position
     * @param t time
     * @return ∂c/∂x
     * @throws IllegalArgumentException if x or t is invalid
     */
    double gradient(double x, double t);

    /**
     * Returns the total flux v·c − D·∂c/∂x at (x, t) (per unit mobile-phase area: multiply by
     * the porosity for a flux per unit bulk area).
     *
     * @param x position
     * @param t time
     * @return the flux
     * @throws IllegalArgumentException if x or t is invalid
     */
    default double flux(double x, double t) {
        final TransportParameters p = parameters();
        return p.velocity() * value(x, t) - p.dispersion() * gradient(x, t);
    }

    /**
     * Returns the flux-averaged concentration c_f = c − (D/v)·∂c/∂x, the ratio of the solute
     * flux to the water flux: what an effluent sample or a pumping well measures (Kreft &amp;
     * Zuber 1978, Chem. Eng. Sci. 33, 1471–1480; Parker &amp; van Genuchten 1984, Water Resour.
     * Res. 20(7), 866–872).
     *
     * @param x position
     * @param t time
     * @return flux / v
     * @throws IllegalArgumentException if x or t is invalid
     * @throws IllegalStateException if v = 0, where there is no water flux
     */
    default double fluxAveraged(double x, double t) {
        final TransportParameters p = parameters();
        if (p.velocity() == 0) {
            throw new IllegalStateException("flux-averaged concentration needs v != 0");
        }
        return value(x, t) - p.dispersion() / p.velocity() * gradient(x, t);
    }

    /**
     * A profile: {@code out[i] = value(x[i], t)}.
     *
     * @param x positions; not modified (unless it is also out)
     * @param t time
     * @param out receives the concentrations; at least as long as x; may be x
     * @throws IllegalArgumentException if an argument is invalid (out then partly written)
     */
    default void values(double[] x, double t, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("out", out, x.length);
        for (int i = 0; i < x.length; i++) {
            out[i] = value(x[i], t);
        }
    }

    /**
     * A breakthrough curve: {@code out[i] = value(x, t[i])}.
     *
     * @param x position
     * @param t times; not modified (unless it is also out)
     * @param out receives the concentrations; at least as long as t; may be t
     * @throws IllegalArgumentException if an argument is invalid (out then partly written)
     */
    default void breakthrough(double x, double[] t, double[] out) {
        Checks.length("t", t, 0);
        Checks.length("out", out, t.length);
        for (int i = 0; i < t.length; i++) {
            out[i] = value(x, t[i]);
        }
    }
}
