package org.advecta.fit;

import java.util.Arrays;
import org.advecta.moments.Moments;
import org.advecta.solution.Solution1D;

/**
 * Starting values for the free parameters from the data's moments (see {@link ParameterFit}).
 */
final class StartingGuess {

    private StartingGuess() {
    }

    /** Returns all parameter values, by ordinal: given, fixed or guessed. */
    static double[] of(TransportModel model, Observations data) {
        final Parameter[] all = Parameter.values();
        final double[] v = new double[all.length];
        for (Parameter p : all) {
            if (model.free().contains(p)) {
                v[p.ordinal()] = model.value(p);
                if (!Double.isNaN(v[p.ordinal()]) && !(v[p.ordinal()] > p.lowerBound())) {
                    throw new IllegalArgumentException(p.symbol() + " = " + v[p.ordinal()]
                        + ": a free parameter's starting value must be > " + p.lowerBound());
                }
            } else {
                v[p.ordinal()] = model.fixedValue(p);
            }
        }
        boolean missing = false;
        for (Parameter p : all) {
            missing |= Double.isNaN(v[p.ordinal()]);
        }
        if (!missing) {
            return v;
        }
        if (model.family().shape() == ModelFamily.Shape.CUSTOM) {
            throw new IllegalArgumentException("model: a custom family has no automatic"
                + " starting guess; give every free parameter a value (withValue)");
        }
        guessTransport(model, data, v);
        final int source = Parameter.SOURCE.ordinal();
        if (Double.isNaN(v[source])) {
            v[source] = 1.0;
            v[source] = scaleOfSource(model, data, v);
        }
        return v;
    }

    private static boolean unset(double[] v, Parameter p) {
        return Double.isNaN(v[p.ordinal()]);
    }

    private static void guessTransport(TransportModel model, Observations data, double[] v) {
        final Observations.Curve curve = longest(data);
        final ModelFamily f = model.family();
        final int iv = Parameter.VELOCITY.ordinal();
        final int id = Parameter.DISPERSION.ordinal();
        final int ir = Parameter.RETARDATION.ordinal();
        final int im = Parameter.DECAY.ordinal();
        final double[] m = curveMoments(curve, f);
        final double mean = m[0];
        final double variance = m[1];
        final double timeScale;
        if (curve.breakthrough) {
            // mean = R·L/v, variance = 2·D·R²·L/v³
            double distance = Math.abs(curve.fixed - f.origin());
            if (!(distance > 0)) {
                distance = 1.0;
            }
            final double tau = mean > 0 ? mean : 1.0;
            if (unset(v, Parameter.RETARDATION)) {
                v[ir] = unset(v, Parameter.VELOCITY) ? 2.0
                    : Math.max(1.5, v[iv] * tau / distance);
            }
            if (unset(v, Parameter.VELOCITY)) {
                v[iv] = v[ir] * distance / tau;
            }
            if (unset(v, Parameter.DISPERSION)) {
                final double vel = Math.abs(v[iv]);
                final double d = variance * vel * vel * vel / (2 * v[ir] * v[ir] * distance);
                v[id] = d > 0 && d < Double.POSITIVE_INFINITY ? d : vel * distance / 100;
            }
            timeScale = tau;
        } else {
            // centre = x₀ + v·t/R, variance = s₀² + 2·D·t/R
            final double t = curve.fixed > 0 ? curve.fixed : 1.0;
            final double shift = mean - f.origin();
            if (unset(v, Parameter.RETARDATION)) {
                v[ir] = unset(v, Parameter.VELOCITY) ? 2.0
                    : Math.max(1.5, v[iv] * t / Math.abs(shift));
            }
            if (unset(v, Parameter.VELOCITY)) {
                final double vel = v[ir] * shift / t;
                v[iv] = vel > 0 ? vel : 1e-3;
            }
            if (unset(v, Parameter.DISPERSION)) {
                final double d = v[ir] * (variance - f.initialVariance()) / (2 * t);
                v[id] = d > 0 && d < Double.POSITIVE_INFINITY ? d
                    : Math.max(v[ir] * variance / (2 * t), 1e-12);
            }
            timeScale = t;
        }
        if (unset(v, Parameter.DECAY)) {
            v[im] = 0.05 / timeScale;
        }
        for (Parameter p : new Parameter[] {Parameter.VELOCITY, Parameter.DISPERSION,
            Parameter.RETARDATION, Parameter.DECAY}) {
            final double x = v[p.ordinal()];
            if (model.free().contains(p) && !(x > p.lowerBound() && x < Double.POSITIVE_INFINITY)) {
                throw new IllegalArgumentException("data: no usable starting value for "
                    + p.symbol() + " from the moments (got " + x + "); give one (withValue)");
            }
        }
    }

    /** Mean and variance of the transport part of a curve (input's own moments removed). */
    private static double[] curveMoments(Observations.Curve curve, ModelFamily f) {
        final int n = curve.c.length;
        final Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Double.compare(curve.varying[a], curve.varying[b]));
        // drop repeated sample points (keep the first)
        final double[] s = new double[n];
        final double[] c = new double[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            final int j = order[i];
            if (m == 0 || curve.varying[j] > s[m - 1]) {
                s[m] = curve.varying[j];
                c[m] = curve.c[j];
                m++;
            }
        }
        final boolean front = f.shape() == ModelFamily.Shape.INLET_CONSTANT
            || f.shape() == ModelFamily.Shape.STEP;
        final double[] ss;
        final double[] cc;
        if (front) {
            // the increments |Δc| at the midpoints: the density of the front's passage
            ss = new double[Math.max(m - 1, 0)];
            cc = new double[ss.length];
            for (int i = 0; i + 1 < m; i++) {
                ss[i] = 0.5 * s[i] + 0.5 * s[i + 1];
                cc[i] = Math.abs(c[i + 1] - c[i]) / (s[i + 1] - s[i]);
            }
        } else {
            ss = Arrays.copyOf(s, m);
            cc = Arrays.copyOf(c, m);
        }
        double mean;
        double variance;
        try {
            final Moments mo = Moments.ofSamples(ss, cc);
            mean = mo.mean();
            variance = mo.variance();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("data: the curve at " + curve.fixed
                + " has no usable moments for a starting guess (" + e.getMessage()
                + "); give starting values (withValue)", e);
        }
        if (curve.breakthrough) {
            if (f.shape() == ModelFamily.Shape.INLET_PULSE) {
                mean -= 0.5 * f.duration();
                variance -= f.duration() * f.duration() / 12;
            } else if (f.shape() == ModelFamily.Shape.INLET_EXPONENTIAL && f.rate() > 0) {
                mean -= 1 / f.rate();
                variance -= 1 / (f.rate() * f.rate());
            }
        }
        return new double[] {mean, variance};
    }

    private static Observations.Curve longest(Observations data) {
        Observations.Curve best = null;
        for (Observations.Curve c : data.curves()) {
            if (best == null || c.c.length > best.c.length) {
                best = c;
            }
        }
        return best;
    }

    /** The least-squares scale of the source: Σ wᵢcᵢmᵢ / Σ wᵢmᵢ², m the model at source 1. */
    private static double scaleOfSource(TransportModel model, Observations data, double[] v) {
        final Solution1D s;
        try {
            s = model.solution(v);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("model: the starting guess is not valid for the"
                + " family (" + e.getMessage() + "); give starting values (withValue)", e);
        }
        double num = 0;
        double den = 0;
        for (Observations.Curve c : data.curves()) {
            for (int i = 0; i < c.c.length; i++) {
                final double m = model.predict(s, c.x(i), c.t(i));
                num += c.w[i] * c.c[i] * m;
                den += c.w[i] * m * m;
            }
        }
        final double scale = num / den;
        return scale > 0 && scale < Double.POSITIVE_INFINITY ? scale : 1.0;
    }
}
