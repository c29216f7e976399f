package org.advecta.solution;

import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * The concentration history imposed at an inlet from t = 0 on: constant, a rectangular pulse,
 * or an exponentially decaying (or growing) level. Immutable.
 */
public final class InletInput {

    /** The shape of the history. */
    public enum Kind {
        /** g(t) = C₀ for t &gt; 0. */
        CONSTANT,
        /** g(t) = C₀ for 0 &lt; t ≤ t₀, then 0. */
        PULSE,
        /** g(t) = C₀·exp(−λt) for t &gt; 0. */
        EXPONENTIAL
    }

    private final Kind kind;
    private final double level;
    private final double duration;
    private final double rate;

    private InletInput(Kind kind, double level, double duration, double rate) {
        this.kind = kind;
        this.level = level;
        this.duration = duration;
        this.rate = rate;
    }

    /**
     * A constant input C₀ from t = 0 on.
     *
     * @param c0 the inlet concentration, finite
     * @return the input
     * @throws IllegalArgumentException if C₀ is not finite
     */
    public static InletInput constant(double c0) {
        return new InletInput(Kind.CONSTANT, Checks.finite("c0", c0), Double.POSITIVE_INFINITY,
            0.0);
    }

    /**
     * A rectangular pulse: C₀ for 0 &lt; t ≤ t₀, then 0.
     *
     * @param c0 the inlet concentration during the pulse, finite
     * @param t0 the duration, finite and &gt; 0
     * @return the input
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static InletInput pulse(double c0, double t0) {
        return new InletInput(Kind.PULSE, Checks.finite("c0", c0), Checks.positive("t0", t0),
            0.0);
    }

    /**
     * An exponentially changing input C₀·exp(−λt); λ &gt; 0 decays (a depleting source),
     * λ &lt; 0 grows.
     *
     * @param c0 the inlet concentration at t = 0, finite
     * @param lambda the rate λ, finite
     * @return the input
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static InletInput exponential(double c0, double lambda) {
        return new InletInput(Kind.EXPONENTIAL, Checks.finite("c0", c0),
            Double.POSITIVE_INFINITY, Checks.finite("lambda", lambda));
    }

    /**
     * Returns the shape.
     *
     * @return the kind
     */
    public Kind kind() {
        return kind;
    }

    /**
     * Returns C₀.
     *
     * @return the level
     */
    public double level() {
        return level;
    }

    /**
     * Returns the pulse duration t₀ (+∞ for the other kinds).
     *
     * @return t₀
     */
    public double duration() {
        return duration;
    }

    /**
     * Returns the rate λ of an exponential input (0 for the other kinds).
     *
     * @return λ
     */
    public double rate() {
        return rate;
    }

    /**
     * Returns g(t), the inlet concentration at time t &gt; 0 (at t = t₀ a pulse is still on).
     *
     * @param t the time, finite and ≥ 0
     * @return g(t)
     * @throws IllegalArgumentException if t is invalid
     */
    public double valueAt(double t) {
        Checks.nonNegative("t", t);
        switch (kind) {
            case PULSE:
                return t <= duration ? level : 0.0;
            case EXPONENTIAL:
                return level * Math.exp(-rate * t);
            default:
                return level;
        }
    }

    @Override
    public String toString() {
        switch (kind) {
            case PULSE:
                return String.format(Locale.ROOT, "pulse(c0=%s, t0=%s)", level, duration);
            case EXPONENTIAL:
                return String.format(Locale.ROOT, "exponential(c0=%s, lambda=%s)", level, rate);
            default:
                return String.format(Locale.ROOT, "constant(c0=%s)", level);
        }
    }
}
