package org.advecta.fit;

import java.util.Arrays;
import java.util.Collections;
import java.util.EnumSet;
import java.util.Set;
import org.advecta.internal.Checks;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;

/**
 * What to fit: a {@link ModelFamily}, what the data measure ({@link Observable}), which
 * {@link Parameter}s are free, and the values of the others (and, optionally, starting values
 * of the free ones). Immutable and thread-safe; each {@code with…} method returns a new model.
 *
 * <p>Defaults: R = 1, μ = 0 and source = 1 when fixed and not given; v and D have no default
 * and must be given unless free. Free parameters without a starting value get one from the
 * data's moments ({@link ParameterFit}).
 *
 * <pre>{@code
 * TransportModel model = TransportModel.of(
 *         ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.5)), Observable.FLUX_AVERAGED)
 *     .withFree(Parameter.VELOCITY, Parameter.DISPERSION)
 *     .withValue(Parameter.SOURCE, 2.0);
 * }</pre>
 */
public final class TransportModel {

    private final ModelFamily family;
    private final Observable observable;
    private final Set<Parameter> free;
    /** Given values, NaN where none was given; indexed by ordinal. */
    private final double[] values;

    private TransportModel(ModelFamily family, Observable observable, Set<Parameter> free,
                           double[] values) {
        this.family = family;
        this.observable = observable;
        this.free = free;
        this.values = values;
    }

    /**
     * Returns a model with v and D free and nothing else given.
     *
     * @param family the family of solutions
     * @param observable what the data measure
     * @return the model
     * @throws IllegalArgumentException if an argument is null
     */
    public static TransportModel of(ModelFamily family, Observable observable) {
        if (family == null) {
            throw new IllegalArgumentException("family: must not be null");
        }
        if (observable == null) {
            throw new IllegalArgumentException("observable: must not be null");
        }
        final double[] v = new double[Parameter.values().length];
        Arrays.fill(v, Double.NaN);
        return new TransportModel(family, observable,
            Collections.unmodifiableSet(EnumSet.of(Parameter.VELOCITY, Parameter.DISPERSION)), v);
    }

    /**
     * Returns a copy in which exactly the given parameters are free.
     *
     * @param parameters the free parameters, at least one
     * @return the new model
     * @throws IllegalArgumentException if none is given or one is null
     */
    public TransportModel withFree(Parameter... parameters) {
        if (parameters == null || parameters.length == 0) {
            throw new IllegalArgumentException("parameters: at least one must be free");
        }
        final EnumSet<Parameter> set = EnumSet.noneOf(Parameter.class);
        for (Parameter p : parameters) {
            if (p == null) {
                throw new IllegalArgumentException("parameters: must not contain null");
            }
            set.add(p);
        }
        return new TransportModel(family, observable, Collections.unmodifiableSet(set), values);
    }

    /**
     * Returns a copy with a value for a parameter: its fixed value if it is not free, its
     * starting value if it is.
     *
     * @param parameter the parameter
     * @param value finite, and &gt; its {@link Parameter#lowerBound()} if the parameter is or
     *     becomes free (v, D, μ, source &gt; 0; R &gt; 1); as a fixed value it must be valid for
     *     the family (e.g. R ≥ 1, μ ≥ 0)
     * @return the new model
     * @throws IllegalArgumentException if the parameter is null or the value is not finite
     */
    public TransportModel withValue(Parameter parameter, double value) {
        if (parameter == null) {
            throw new IllegalArgumentException("parameter: must not be null");
        }
        Checks.finite(parameter.symbol(), value);
        final double[] v = values.clone();
        v[parameter.ordinal()] = value;
        return new TransportModel(family, observable, free, v);
    }

    /**
     * Returns the family.
     *
     * @return the family
     */
    public ModelFamily family() {
        return family;
    }

    /**
     * Returns what the data measure.
     *
     * @return the observable
     */
    public Observable observable() {
        return observable;
    }

    /**
     * Returns the free parameters, in {@link Parameter} order.
     *
     * @return an unmodifiable set
     */
    public Set<Parameter> free() {
        return free;
    }

    /**
     * Returns the value given for a parameter, or NaN if none was given.
     *
     * @param parameter the parameter
     * @return the fixed or starting value, or NaN
     */
    public double value(Parameter parameter) {
        return values[parameter.ordinal()];
    }

    /** The value to use for a fixed parameter (with defaults), validated. */
    double fixedValue(Parameter p) {
        final double v = values[p.ordinal()];
        if (!Double.isNaN(v)) {
            return v;
        }
        switch (p) {
            case RETARDATION:
                return 1.0;
            case DECAY:
                return 0.0;
            case SOURCE:
                return 1.0;
            default:
                throw new IllegalArgumentException(p.symbol()
                    + ": a fixed " + p.name().toLowerCase(java.util.Locale.ROOT)
                    + " needs a value (withValue)");
        }
    }

    /** The solution for full parameter values indexed by ordinal. */
    Solution1D solution(double[] all) {
        final TransportParameters p = TransportParameters.of(all[Parameter.VELOCITY.ordinal()],
                all[Parameter.DISPERSION.ordinal()])
            .withRetardation(all[Parameter.RETARDATION.ordinal()])
            .withDecay(all[Parameter.DECAY.ordinal()]);
        final Solution1D s = family.create(p, all[Parameter.SOURCE.ordinal()]);
        if (s == null) {
            throw new IllegalStateException("family: the builder returned null");
        }
        return s;
    }

    /** The model's prediction at one observation. */
    double predict(Solution1D s, double x, double t) {
        return observable == Observable.FLUX_AVERAGED ? s.fluxAveraged(x, t) : s.value(x, t);
    }
}
