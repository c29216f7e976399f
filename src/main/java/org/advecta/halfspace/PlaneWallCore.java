package org.advecta.halfspace;

import org.advecta.internal.Checks;
import org.advecta.internal.Spread;
import org.advecta.transport.TransportParameters;

/**
 * The engine of {@link HalfSpaceKernel2D} and {@link HalfSpaceKernel3D}: a product of one
 * factor per axis, evaluated as one exponential of the summed (double-double) exponents so
 * that no factor underflows first.
 *
 * <pre>
 * wall x = 0:           c = K(x; x₀) · g_T(y − y₀) · g_V(z − z₀)
 * wall y = 0 (or z):    c = G(x; x₀) · [g_T(y − y₀) ∓ g_T(y + y₀)] · g_V(z − z₀)
 * </pre>
 * K the 1D half-line kernel along the flow ({@link HalfSpaceKernel1D}, with v, D_L, R, μ),
 * G the free 1D kernel along x (with v and the decay), g_T, g_V the free Gaussians without
 * drift or decay, and the bracket the classical mirror image of a wall parallel to the flow
 * (− absorbing, + zero flux), = g_T(y − y₀)·(1 ∓ e^{−y y₀ R/(D_T t)}).
 */
final class PlaneWallCore {

    private final Wall wall;
    private final WallAxis axis;
    private final boolean threeD;
    private final double x0;
    private final double y0;
    private final double z0;
    private final double velocity;
    private final double dL;
    private final double dT;
    private final double dV;
    private final double retardation;
    private final double decayRate;
    /** The 1D half-line kernel along x, for the wall x = 0; null otherwise. */
    private final HalfSpaceKernel1D normal;
    /** The 1D half-line kernel along the wall's normal, for the mass and the wall flux. */
    private final HalfSpaceKernel1D massKernel;

    PlaneWallCore(TransportParameters p, Wall wall, WallAxis axis, boolean threeD, double x0,
                  double y0, double z0) {
        if (p == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        if (wall == null) {
            throw new IllegalArgumentException("wall: must not be null");
        }
        if (axis == null || (!threeD && axis == WallAxis.Z)) {
            throw new IllegalArgumentException("axis: must be X or Y" + (threeD ? " or Z" : "")
                + ", got " + axis);
        }
        this.wall = wall;
        this.axis = axis;
        this.threeD = threeD;
        this.x0 = axis == WallAxis.X ? Checks.positive("x0", x0) : Checks.finite("x0", x0);
        this.y0 = axis == WallAxis.Y ? Checks.positive("y0", y0) : Checks.finite("y0", y0);
        this.z0 = axis == WallAxis.Z ? Checks.positive("z0", z0) : Checks.finite("z0", z0);
        this.velocity = p.velocity();
        this.dL = p.dispersion();
        this.dT = p.transverseDispersion();
        this.dV = p.verticalDispersion();
        this.retardation = p.retardation();
        this.decayRate = p.decayRate();
        this.normal = axis == WallAxis.X ? HalfSpaceKernel1D.of(p, wall, x0) : null;
        switch (axis) {
            case X:
                this.massKernel = normal;
                break;
            case Y:
                this.massKernel = HalfSpaceKernel1D.of(TransportParameters.of(0.0, dT)
                    .withRetardation(retardation).withDecay(decayRate), wall, y0);
                break;
            default:
                this.massKernel = HalfSpaceKernel1D.of(TransportParameters.of(0.0, dV)
                    .withRetardation(retardation).withDecay(decayRate), wall, z0);
                break;
        }
    }

    /** Which quantity to form. */
    enum Quantity { VALUE, GRADIENT_X, GRADIENT_Y, GRADIENT_Z, FLUX_X }

    HalfSpaceKernel1D massKernel() {
        return massKernel;
    }

    /** The per-time constants of the three axes. */
    final class Frame {
        final double t;
        final boolean limit;
        final HalfSpaceKernel1D.Frame fx;
        final Spread sx;
        final Spread sy;
        final Spread sz;
        final double ch;
        final double cl;
        final double dh;
        final double dl;

        Frame(double t) {
            Checks.nonNegative("t", t);
            this.t = t;
            final double[] c = Spread.centre(x0, velocity, retardation, t);
            this.ch = c[0];
            this.cl = c[1];
            final double[] d = Spread.decay(decayRate, retardation, t);
            this.dh = d[0];
            this.dl = d[1];
            if (t == 0) {
                this.sx = null;
                this.sy = null;
                this.sz = null;
                this.fx = null;
                this.limit = true;
            } else {
                this.sx = Spread.of(dL, retardation, t);
                this.sy = Spread.of(dT, retardation, t);
                this.sz = threeD ? Spread.of(dV, retardation, t) : null;
                this.fx = normal == null ? null : normal.frame(t);
                this.limit = sx.collapsed || sy.collapsed || (threeD && sz.collapsed);
            }
        }
    }

    Frame frame(double t) {
        return new Frame(t);
    }

    /** Validates a point: the wall's coordinate ≥ 0, the others finite. */
    void check(double x, double y, double z) {
        if (axis == WallAxis.X) {
            Checks.nonNegative("x", x);
        } else {
            Checks.finite("x", x);
        }
        if (axis == WallAxis.Y) {
            Checks.nonNegative("y", y);
        } else {
            Checks.finite("y", y);
        }
        if (threeD) {
            if (axis == WallAxis.Z) {
                Checks.nonNegative("z", z);
            } else {
                Checks.finite("z", z);
            }
        }
    }

    double evaluate(Frame f, Quantity q, double x, double y, double z) {
        if (f.limit) {
            final boolean atSource = x == f.ch && y == y0 && (!threeD || z == z0);
            if (q == Quantity.VALUE) {
                return atSource ? Double.POSITIVE_INFINITY : 0.0;
            }
            if (q == Quantity.FLUX_X) {
                return atSource && velocity != 0 ? velocity * Double.POSITIVE_INFINITY : 0.0;
            }
            return 0.0;
        }
        // exponent and normalisation of the free transverse axes (and, below, their factors)
        double eh = 0;
        double el = 0;
        double norm = 1;
        double factor = 1;
        if (axis != WallAxis.Y) {
            final double h = f.sy.exponentHigh(y, y0, 0.0);
            eh = h;
            el = f.sy.exponentLow(y, y0, 0.0, h);
            norm = f.sy.norm;
            if (q == Quantity.GRADIENT_Y) {
                factor = -2 * (y - y0) * f.sy.high;
            }
        }
        if (threeD && axis != WallAxis.Z) {
            final double h = f.sz.exponentHigh(z, z0, 0.0);
            final double s = eh + h;
            final double bv = s - eh;
            el += (eh - (s - bv)) + (h - bv) + f.sz.exponentLow(z, z0, 0.0, h);
            eh = s;
            norm *= f.sz.norm;
            if (q == Quantity.GRADIENT_Z) {
                factor = -2 * (z - z0) * f.sz.high;
            }
        }
        if (axis == WallAxis.X) {
            final double m = norm * factor;
            switch (q) {
                case GRADIENT_X:
                    return normal.gradient(f.fx, x, m, eh, el);
                case FLUX_X:
                    return normal.flux(f.fx, x, m, eh, el);
                default:
                    return normal.value(f.fx, x, m, eh, el);
            }
        }
        // wall parallel to the flow: mirrored factor along w, free drifting factor along x
        final boolean onY = axis == WallAxis.Y;
        final Spread sw = onY ? f.sy : f.sz;
        final double w = onY ? y : z;
        final double w0 = onY ? y0 : z0;
        final double kw = 4 * w * w0 * sw.high;
        final double e = Math.exp(-kw);
        final double em = HalfSpaceKernel1D.oneMinus(kw, e);
        final double twoDist = 2 * (w - w0) * sw.high;
        final double bracket;
        if ((onY && q == Quantity.GRADIENT_Y) || (!onY && q == Quantity.GRADIENT_Z)) {
            final double k = 4 * w0 * sw.high;
            // absorbing: 2·R/(4Dt)·[−(w − w₀)(1 − e) + 2w₀e];
            // zero flux: 2·R/(4Dt)·[−w(1 + e) + w₀(1 − e)] (∝ w near the wall)
            bracket = wall == Wall.ABSORBING ? -twoDist * em + k * e
                : 2 * sw.high * (-w * (1 + e) + w0 * em);
        } else {
            bracket = wall == Wall.ABSORBING ? em : 1 + e;
        }
        final double wh = sw.exponentHigh(w, w0, 0.0);
        final double wl = sw.exponentLow(w, w0, 0.0, wh);
        final double xh = f.sx.exponentHigh(x, f.ch, f.cl);
        final double xl = f.sx.exponentLow(x, f.ch, f.cl, xh);
        final double xiX = (x - f.ch) - f.cl;
        final double fx;
        switch (q) {
            case GRADIENT_X:
                fx = -2 * xiX * f.sx.high;
                break;
            case FLUX_X:
                fx = velocity + 2 * dL * xiX * f.sx.high;
                break;
            default:
                fx = 1;
                break;
        }
        final double m = norm * factor * f.sx.norm * sw.norm * bracket * fx;
        return Spread.combine(m, f.dh, xh, xl, wh, wl, eh, el - f.dl);
    }
}
