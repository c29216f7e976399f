package org.advecta.solution;

import java.util.function.DoubleUnaryOperator;
import org.advecta.internal.GaussLegendre;

/**
 * A composite 10-point Gauss–Legendre sum over [0, length], panel by panel from 0, each
 * panel's half-width given by a rule of its left end (capped at half of what remains), the
 * panels added with Neumaier's compensation. The erfcx-derivative integrals of the flux
 * inlet's ramp responses use it with panels short enough for the rule to be exact to
 * rounding on them (see {@link ThirdTypeRampIntegral}).
 */
final class PanelSum {

    /** The half-width of the panel that starts at offset o. */
    @FunctionalInterface
    interface HalfWidth {
        /**
         * @param o the panel's left end, in [0, length)
         * @return its half-width, &gt; 0
         */
        double at(double o);
    }

    private PanelSum() {
    }

    /**
     * Returns ∫₀^length f.
     *
     * @param length the interval's length, ≥ 0
     * @param rule half-width of each panel from its left end
     * @param f the integrand, of the offset from 0
     * @return the sum of the panels' rules
     */
    static double over(double length, HalfWidth rule, DoubleUnaryOperator f) {
        double sum = 0;
        double comp = 0;
        double o = 0;
        while (o < length) {
            final double h = Math.min(rule.at(o), 0.5 * (length - o));
            final double centre = o + h;
            final double term = GaussLegendre.integrate(f, centre, h);
            final double s = sum + term;
            comp += Math.abs(sum) >= Math.abs(term) ? (sum - s) + term : (term - s) + sum;
            sum = s;
            if (!(centre + h > o)) {
                // h below the resolution of o: the rest is not representable
                break;
            }
            o = centre + h;
        }
        return sum + comp;
    }
}
