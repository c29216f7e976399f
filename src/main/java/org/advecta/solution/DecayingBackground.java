package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.internal.Spread;
import org.advecta.transport.TransportParameters;

/**
 * A uniform concentration C_b that decays with the medium: c(x, t) = C_b·exp(−μt/R), on the
 * infinite line. It solves the equation exactly and lets other solutions be superposed on a
 * background level.
 *
 * <p>Accuracy: within 2 ULP of C_b·exp(−μt/R) at the exact arguments (one exponential and one
 * product); the gradient is exactly 0.
 */
public final class DecayingBackground extends AbstractSolution1D {

    private final double level;

    private DecayingBackground(TransportParameters parameters, double level) {
        super(parameters, Domain.LINE);
        this.level = Checks.finite("cb", level);
    }

    /**
     * Returns the decaying background.
     *
     * @param parameters v, D, R, μ
     * @param level C_b, the concentration at t = 0, finite
     * @return the solution
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static DecayingBackground of(TransportParameters parameters, double level) {
        return new DecayingBackground(parameters, level);
    }

    @Override
    double valueAt(double x, double t) {
        return level * Math.exp(decayExponent(t));
    }

    @Override
    Spread spreadAt(double t) {
        return null; // uniform: no Gaussian
    }

    @Override
    double gradientAt(double x, double t) {
        return 0.0;
    }

    @Override
    double initialValue(double x) {
        return level;
    }

    @Override
    double initialGradient(double x) {
        return 0.0;
    }
}
