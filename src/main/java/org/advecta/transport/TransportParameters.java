package org.advecta.transport;

import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * Velocity, dispersion, retardation and first-order decay of solute (or heat) carried by a
 * uniform flow along x. Immutable and thread-safe.
 *
 * <p>The governing equation, in one dimension and in every model of the library, is
 * <pre>
 * R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c
 * </pre>
 * with c the concentration in the mobile (dissolved) phase, v the velocity (any sign),
 * D &gt; 0 the dispersion coefficient, R ≥ 1 the retardation factor and μ ≥ 0 the
 * first-order decay rate of the equation.
 *
 * <p><b>Decay convention.</b> Sources differ on whether decay acts on the dissolved phase
 * only or on the dissolved and sorbed phases alike. The library's μ is the coefficient of
 * the term −μc above. {@link #withDecay(double)} sets it directly (decay of the dissolved
 * phase only, rate μ); {@link #withDecayOnBothPhases(double)} takes the rate k of a decay
 * that acts on both phases alike, which enters the equation as μ = k·R: the decay term
 * θμ_l c + ρ_b μ_s K_d c divided by θ is (μ_l + μ_s (R − 1)) c, which is k·R·c when
 * μ_l = μ_s = k (van Genuchten &amp; Alves 1982, USDA Tech. Bull. 1661, combine the two rates
 * the same way). In two and three dimensions
 * the dispersion tensor is diagonal: D_L along the flow (x), D_T across it (y) and D_V
 * across it in the third direction (z); {@link #of(double, double)} sets all three equal.
 *
 * <p>Units are the caller's: any consistent set of length L and time T gives v in L/T,
 * D in L²/T and μ in 1/T; R is dimensionless.
 *
 * <p>Create with {@link #of(double, double)} and refine with the {@code with…} methods,
 * each of which returns a new instance:
 * <pre>{@code
 * TransportParameters p = TransportParameters.of(0.5, 0.02)   // v, D
 *     .withRetardation(2.0)
 *     .withDecay(1e-3);
 * }</pre>
 */
public final class TransportParameters {

    private final double velocity;
    private final double longitudinal;
    private final double transverse;
    private final double vertical;
    private final double retardation;
    private final double decay;
    /** True when {@link #decay} is the rate k of both phases (μ = kR), false when it is μ. */
    private final boolean bothPhases;

    private TransportParameters(double velocity, double longitudinal, double transverse,
                                double vertical, double retardation, double decay,
                                boolean bothPhases) {
        this.velocity = velocity;
        this.longitudinal = longitudinal;
        this.transverse = transverse;
        this.vertical = vertical;
        this.retardation = retardation;
        this.decay = decay;
        this.bothPhases = bothPhases;
        if (!(decayRate() < Double.POSITIVE_INFINITY)) {
            throw Checks.fail("mu", decayRate(), "k·R must be finite");
        }
    }

    /**
     * Returns parameters with velocity v and isotropic dispersion D, no sorption (R = 1) and
     * no decay (μ = 0).
     *
     * @param v velocity along x, finite, any sign
     * @param d dispersion coefficient, finite and &gt; 0 (all three directions)
     * @return the parameters
     * @throws IllegalArgumentException if v is not finite or D is not finite and positive
     */
    public static TransportParameters of(double v, double d) {
        Checks.finite("v", v);
        Checks.positive("D", d);
        return new TransportParameters(v, d, d, d, 1.0, 0.0, false);
    }

    /**
     * Returns a copy with the given retardation factor.
     *
     * @param r retardation factor R = 1 + ρ_b K_d / θ, finite and ≥ 1
     * @return the new parameters
     * @throws IllegalArgumentException if R is not finite or below 1
     */
    public TransportParameters withRetardation(double r) {
        Checks.atLeast("R", r, 1.0);
        return new TransportParameters(velocity, longitudinal, transverse, vertical, r, decay,
            bothPhases);
    }

    /**
     * Returns a copy with the given first-order decay rate μ, acting on the dissolved phase
     * only (the term −μc of the equation). The dissolved concentration of a released mass
     * then decays as exp(−μt/R).
     *
     * @param mu decay rate, finite and ≥ 0
     * @return the new parameters
     * @throws IllegalArgumentException if μ is not finite or negative
     */
    public TransportParameters withDecay(double mu) {
        Checks.nonNegative("mu", mu);
        return new TransportParameters(velocity, longitudinal, transverse, vertical,
            retardation, mu, false);
    }

    /**
     * Returns a copy with a first-order decay of rate k that acts on the dissolved and the
     * sorbed phase alike (as radioactive decay does). In the library's equation this is
     * μ = k·R, and μ follows R if the retardation is changed afterwards. The dissolved
     * concentration of a released mass then decays as exp(−kt).
     *
     * @param k decay rate of both phases, finite and ≥ 0
     * @return the new parameters
     * @throws IllegalArgumentException if k is not finite or negative
     */
    public TransportParameters withDecayOnBothPhases(double k) {
        Checks.nonNegative("k", k);
        return new TransportParameters(velocity, longitudinal, transverse, vertical,
            retardation, k, true);
    }

    /**
     * Returns a copy with anisotropic dispersion.
     *
     * @param dL longitudinal dispersion coefficient (along x, the flow), finite and &gt; 0
     * @param dT transverse dispersion coefficient (along y), finite and &gt; 0
     * @param dV transverse dispersion coefficient in the third direction (along z),
     *     finite and &gt; 0
     * @return the new parameters
     * @throws IllegalArgumentException if any coefficient is not finite and positive
     */
    public TransportParameters withDispersion(double dL, double dT, double dV) {
        Checks.positive("DL", dL);
        Checks.positive("DT", dT);
        Checks.positive("DV", dV);
        return new TransportParameters(velocity, dL, dT, dV, retardation, decay, bothPhases);
    }

    /**
     * Returns the velocity v along x.
     *
     * @return v
     */
    public double velocity() {
        return velocity;
    }

    /**
     * Returns the dispersion coefficient along the flow, D = D_L, used by one-dimensional
     * models.
     *
     * @return D_L
     */
    public double dispersion() {
        return longitudinal;
    }

    /**
     * Returns the transverse dispersion coefficient D_T (along y).
     *
     * @return D_T
     */
    public double transverseDispersion() {
        return transverse;
    }

    /**
     * Returns the transverse dispersion coefficient D_V in the third direction (along z).
     *
     * @return D_V
     */
    public double verticalDispersion() {
        return vertical;
    }

    /**
     * Returns the retardation factor R.
     *
     * @return R ≥ 1
     */
    public double retardation() {
        return retardation;
    }

    /**
     * Returns the decay coefficient μ of the equation (the term −μc): the value given to
     * {@link #withDecay(double)}, or k·R after {@link #withDecayOnBothPhases(double)}.
     *
     * @return μ ≥ 0 (+∞ only if k·R overflows)
     */
    public double decayRate() {
        return bothPhases ? decay * retardation : decay;
    }

    /**
     * Returns true when the decay was given as a rate acting on both phases
     * ({@link #withDecayOnBothPhases(double)}).
     *
     * @return whether μ = k·R
     */
    public boolean isDecayOnBothPhases() {
        return bothPhases;
    }

    /**
     * Returns the retarded velocity v/R, the speed at which the centre of mass of a
     * released solute moves.
     *
     * @return v/R
     */
    public double retardedVelocity() {
        return velocity / retardation;
    }

    /**
     * Returns the Péclet number |v|·L/D_L for a length L, the ratio of advective to
     * dispersive transport over that length.
     *
     * @param length the length L (e.g. the travel distance), finite and &gt; 0
     * @return |v|·L/D_L (may round to +∞ for extreme inputs)
     * @throws IllegalArgumentException if L is not finite and positive
     */
    public double pecletNumber(double length) {
        Checks.positive("length", length);
        return Math.abs(velocity) * length / longitudinal;
    }

    /**
     * Returns the Damköhler number μ·L/|v| for a length L, the ratio of the advective
     * travel time R·L/|v| to the decay time R/μ (retardation cancels out).
     *
     * <p>Special cases: 0 when μ = 0; +∞ when v = 0 and μ &gt; 0.
     *
     * @param length the length L, finite and &gt; 0
     * @return μ·L/|v|
     * @throws IllegalArgumentException if L is not finite and positive
     */
    public double damkohlerNumber(double length) {
        Checks.positive("length", length);
        if (decay == 0) {
            return 0.0;
        }
        return decayRate() * length / Math.abs(velocity);
    }

    @Override
    public boolean equals(Object obj) {
        if (this == obj) {
            return true;
        }
        if (!(obj instanceof TransportParameters)) {
            return false;
        }
        final TransportParameters o = (TransportParameters) obj;
        return Double.compare(velocity, o.velocity) == 0
            && Double.compare(longitudinal, o.longitudinal) == 0
            && Double.compare(transverse, o.transverse) == 0
            && Double.compare(vertical, o.vertical) == 0
            && Double.compare(retardation, o.retardation) == 0
            && Double.compare(decay, o.decay) == 0
            && bothPhases == o.bothPhases;
    }

    @Override
    public int hashCode() {
        int h = Double.hashCode(velocity);
        h = 31 * h + Double.hashCode(longitudinal);
        h = 31 * h + Double.hashCode(transverse);
        h = 31 * h + Double.hashCode(vertical);
        h = 31 * h + Double.hashCode(retardation);
        h = 31 * h + Double.hashCode(decay);
        return 31 * h + Boolean.hashCode(bothPhases);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT,
            "TransportParameters[v=%s, DL=%s, DT=%s, DV=%s, R=%s, mu=%s%s]",
            velocity, longitudinal, transverse, vertical, retardation, decayRate(),
            bothPhases ? " (k=" + decay + " on both phases)" : "");
    }
}
