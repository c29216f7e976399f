package org.advecta.convolution;

import org.advecta.halfspace.Wall;
import org.advecta.internal.Checks;
import org.advecta.solution.Domain;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.Exponentials;
import org.advecta.transport.TransportParameters;

/**
 * The Green's function of the half-line x ≥ 0 with a wall at x = 0 (flow normal to it, either
 * sign of v), as a {@link ConvolutionKernel} with closed-form segment integrals:
 * {@link ProfileConvolution} (samples) and {@link FunctionConvolution} (a function) then give
 * the solution for initial data on the half-line. Immutable and thread-safe.
 *
 * <pre>
 * absorbing wall, c(0, t) = 0:           G = E·[G₀ − I]
 * zero-flux wall, v c − D ∂c/∂x = 0:     G = E·[G₀ + I − (v/(2D))·e^{vx/D}·erfc(z)]
 * G₀ = exp(−y²)/(L√π),   I = G₀·exp(−4xξ/L²) = exp(vx/D − z²)/(L√π)
 * y = (x − vt/R − ξ)/L,  z = (x + ξ + vt/R)/L,  L = √(4Dt/R),  E = exp(−μt/R)
 * </pre>
 *
 * <p>Derivation (method of images): c = exp(vx/(2D) − v²t/(4DR))·w turns the equation into
 * the heat equation for w; the absorbing wall keeps w(0) = 0 (image −g(x + ξ)) and the
 * zero-flux wall becomes the radiation condition w′ = (v/(2D))·w, whose Green's function is
 * g(x − ξ) + g(x + ξ) − 2h∫₀^∞ e^{−hη}g(x + ξ + η) dη, h = v/(2D) (Carslaw &amp; Jaeger 1959,
 * §14.2). The identity I/G₀ = exp(−4xξ/L²) keeps the image free of overflow. The same
 * Green's function is that of {@link org.advecta.halfspace.HalfSpaceKernel1D} (the tests check
 * the two against each other, and the segment integrals against
 * {@link org.advecta.halfspace.HalfLineSlug} and {@link org.advecta.halfspace.HalfLineStep});
 * here it comes with its integrals over segments, evaluated without allocation.
 *
 * <p><b>Segment integrals.</b> For φ linear on [a, b] ⊂ [0, ∞): the free part as
 * {@link InfiniteLineKernel}; the image is a Gaussian in ξ centred at −x − vt/R, so its hat
 * weights are those of the free kernel at the mirrored centre, times e^{vx/D}, evaluated
 * scaled (exp(vx/D − z²) = exp(−y² − 4xξ/L²) at the segment's end nearest the image centre
 * times erfcx forms, no overflow at any Péclet number); the erfc term's hat weights are
 * closed forms in the repeated integrals i¹erfc, i²erfc (through erfcx′ and erfcx″, see
 * WallIntegrals). Gradients by ∂I/∂x = ∂I/∂ξ + (v/D)·I and ∂(e^{vx/D}erfc z)/∂x =
 * (v/D)·e^{vx/D}erfc z − 2I (each integrated by parts where needed).
 *
 * <p><b>Accuracy.</b> Each wall term is evaluated without overflow at any Péclet number and
 * without cancellation of its own; the sum of the free part and the wall terms may cancel near
 * the wall (the absorbing wall's G₀ − I, the zero-flux wall with flow away from it), so the
 * contract is relative to Σ|terms|: a segment integral is within (1e-12 + 16κ·2⁻⁵³) of
 * |φ|-weighted ∫|G| plus the free part, κ = 2(1 + y)(|x| + |vt/R| + |ξ|)/L the positions'
 * sensitivity (y the distance in widths of the segment from the centre), enforced against
 * Gauss–Legendre quadrature of the point values in HalfLineKernelTest (measured worst 0.07 of
 * it). Point values of the absorbing kernel are G₀·(1 − e^{−4xξ/L²}) (no cancellation, exactly
 * 0 on the wall). Against the 50/60-digit mpmath fixtures of data near a wall (both walls,
 * v from −2 to 4, Péclet numbers vt/(RL) to 16, values down to 1e-120) the worst relative
 * error of the sampled data is 1.2e-13 (HalfLineConvolutionTest).
 *
 * <p><b>Width.</b> For the zero-flux wall with flow towards it (v &lt; 0) solute piles up
 * against the wall over the whole distance |v|t/R it was carried: the erfc term reaches
 * from the centre x − vt/R back to the wall, so {@link Snapshot#width()} is L + |v|t/R
 * there (the routes integrate ±10 or more widths about the centre); otherwise L.
 *
 * <p><b>Collapsed kernel</b> (t = 0 or 4Dt/R below 2⁻⁶⁰⁰): the free kernel's delta; the wall
 * layer (then thinner than any resolvable length) is not represented. The fast uniform-grid
 * path {@link ProfileConvolution#valuesOnGrid} takes the free part as a discrete convolution
 * and adds these wall terms as weights of the offset i + k, where they are not negligible.
 */
public final class HalfLineKernel implements ConvolutionKernel {

    private final TransportParameters parameters;
    private final boolean zeroFlux;

    private HalfLineKernel(TransportParameters parameters, boolean zeroFlux) {
        this.parameters = parameters;
        this.zeroFlux = zeroFlux;
    }

    /**
     * Returns the kernel of the half-line x ≥ 0 with the given wall at x = 0:
     * {@link Wall#ABSORBING} (c = 0) or {@link Wall#ZERO_FLUX} (v c − D ∂c/∂x = 0; with μ = 0
     * mass is conserved).
     *
     * @param parameters v (either sign), D, R, μ
     * @param wall the wall condition
     * @return the kernel
     * @throws IllegalArgumentException if an argument is null
     */
    public static HalfLineKernel of(TransportParameters parameters, Wall wall) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        if (wall == null) {
            throw new IllegalArgumentException("wall: must not be null");
        }
        return new HalfLineKernel(parameters, wall == Wall.ZERO_FLUX);
    }

    /**
     * Returns the wall condition.
     *
     * @return the wall
     */
    public Wall wall() {
        return zeroFlux ? Wall.ZERO_FLUX : Wall.ABSORBING;
    }

    @Override
    public TransportParameters parameters() {
        return parameters;
    }

    @Override
    public Domain domain() {
        return Domain.HALF_LINE;
    }

    @Override
    public ConvolutionKernel.Snapshot at(double t) {
        Checks.nonNegative("t", t);
        return new Frozen(new InfiniteLineKernel.Frozen(parameters, t), zeroFlux);
    }

    /** The half-line kernel at one time (package-private for the grid path, WallGridConvolution). */
    static final class Frozen implements ConvolutionKernel.Snapshot {

        private final InfiniteLineKernel.Frozen free;
        private final boolean zeroFlux;
        private final double decay;
        private final double width;
        private final double invWidth;
        /** 1/(L√π). */
        private final double norm;
        /** P = (vt/R)/L, the drift in widths. */
        private final double pe;
        private final double driftHigh;
        private final double driftLow;
        private final boolean collapsed;

        Frozen(InfiniteLineKernel.Frozen free, boolean zeroFlux) {
            this.free = free;
            this.zeroFlux = zeroFlux;
            this.decay = free.decay();
            this.collapsed = free.collapsed();
            this.driftHigh = free.driftHigh();
            this.driftLow = free.driftLow();
            final double l = free.width();
            this.invWidth = collapsed ? Double.POSITIVE_INFINITY : 1 / l;
            this.norm = collapsed ? Double.POSITIVE_INFINITY : invWidth * SegmentIntegrals.ONE_OVER_SQRT_PI;
            this.pe = collapsed ? 0.0 : free.scale(free.drift());
            final double drift = free.drift();
            this.width = collapsed ? 0.0 : zeroFlux && drift < 0 ? l - drift : l;
        }

        @Override
        public boolean collapsed() {
            return collapsed;
        }

        /** The free kernel G₀ (with E) at the same time. */
        InfiniteLineKernel.Frozen free() {
            return free;
        }

        /** True for the zero-flux wall. */
        boolean zeroFlux() {
            return zeroFlux;
        }

        /** P = (vt/R)/L, the drift in widths. */
        double pe() {
            return pe;
        }

        @Override
        public boolean translationInvariant() {
            return false;
        }

        @Override
        public double decay() {
            return decay;
        }

        @Override
        public double origin(double x) {
            return free.origin(x);
        }

        @Override
        public double width() {
            return width;
        }

        // ------------------------------------------------------------ scaled positions

        /** q = 4xξ/L². */
        private double q(double x, double xi) {
            return 4 * free.scale(x) * free.scale(xi);
        }

        /** z = (x + ξ + vt/R)/L with one rounding of the sum. */
        private double z(double x, double xi) {
            final double s = x + xi;
            final double e1 = twoSumError(x, xi, s);
            final double s2 = s + driftHigh;
            final double e2 = twoSumError(s, driftHigh, s2);
            return free.scale(s2 + ((e1 + e2) + driftLow));
        }

        /** vx/D = 4P·x/L. */
        private double kappa(double x) {
            return 4 * pe * free.scale(x);
        }

        private static double twoSumError(double a, double b, double s) {
            final double bb = s - a;
            return (a - (s - bb)) + (b - bb);
        }

        /** exp(vx/D − z²) = exp(−y² − q) at (x, ξ). */
        private double imageFactor(double x, double xi) {
            return Exponentials.expMinusSquare(-q(x, xi), free.scaled(x, xi));
        }

        // ------------------------------------------------------------ the wall terms (no E)

        /** I(x, ξ) = exp(vx/D − z²)/(L√π). */
        private double image(double x, double xi) {
            return norm * imageFactor(x, xi);
        }

        /** T(x, ξ) = e^{vx/D}·erfc(z). */
        private double erfcTerm(double x, double xi) {
            final double z = z(x, xi);
            if (z >= 0) {
                return imageFactor(x, xi) * ErrorFunctions.erfcx(z);
            }
            // z < 0 needs vt/R < 0, so vx/D ≤ 0
            return Math.exp(kappa(x)) * ErrorFunctions.erfc(z);
        }

        /** ∫ₐᵇ φ·I dξ for φ linear, fa at a, fb at b. */
        private double imageLinear(double x, double a, double b, double fa, double fb) {
            final double za = z(x, a);
            final double zb = z(x, b);
            final double h = free.scale(0.5 * b - 0.5 * a);
            final double m = 0.5 * za + 0.5 * zb;
            // the image is a Gaussian in z: weight of the end b is rising(m, h, za, zb)
            final double factor;
            if (za >= 0) {
                factor = imageFactor(x, a);
            } else if (zb <= 0) {
                factor = imageFactor(x, b);
            } else {
                factor = Math.exp(kappa(x));
            }
            if (factor == 0) {
                return 0.0;
            }
            double r = 0;
            if (fb != 0) {
                r += fb * WallIntegrals.risingScaled(m, h, za, zb);
            }
            if (fa != 0) {
                r += fa * WallIntegrals.risingScaled(-m, h, -zb, -za);
            }
            return factor * r;
        }

        /** ∫ₐᵇ φ·T dξ (T = e^{vx/D}erfc z) for φ linear: L·e^{vx/D}·(fa·low + fb·high). */
        private double erfcLinear(double x, double a, double b, double fa, double fb) {
            final double za = z(x, a);
            final double zb = z(x, b);
            final double h = free.scale(0.5 * b - 0.5 * a);
            final double factor = za >= 0 ? imageFactor(x, a) : Math.exp(kappa(x));
            if (factor == 0) {
                return 0.0;
            }
            double r = 0;
            if (fa != 0) {
                r += fa * WallIntegrals.erfcHat(za, zb, h, false);
            }
            if (fb != 0) {
                r += fb * WallIntegrals.erfcHat(za, zb, h, true);
            }
            return free.width() * factor * r;
        }

        /** ∫_b^∞ I dξ = ½e^{vx/D}erfc(z_b). */
        private double imageTail(double x, double b) {
            final double zb = z(x, b);
            if (zb >= 0) {
                return 0.5 * imageFactor(x, b) * ErrorFunctions.erfcx(zb);
            }
            return 0.5 * Math.exp(kappa(x)) * ErrorFunctions.erfc(zb);
        }

        /** ∫_b^∞ T dξ = L·e^{vx/D}·i¹erfc(z_b). */
        private double erfcTail(double x, double b) {
            final double zb = z(x, b);
            if (zb >= 0) {
                return free.width() * imageFactor(x, b) * WallIntegrals.i1s(zb);
            }
            return free.width() * Math.exp(kappa(x)) * WallIntegrals.i1Negative(zb);
        }

        /** The coefficient v/(2D) = 2P/L of T in the zero-flux kernel. */
        private double halfVOverD() {
            return 2 * pe * invWidth;
        }

        /** v/D = 4P/L. */
        private double vOverD() {
            return 4 * pe * invWidth;
        }

        // ------------------------------------------------------------ Snapshot

        @Override
        public double value(double x, double xi) {
            if (collapsed) {
                return free.value(x, xi);
            }
            if (!zeroFlux) {
                // G₀ − I = G₀·(1 − e^{−q}): no cancellation, exactly 0 on the wall
                return free.value(x, xi) * -Math.expm1(-q(x, xi));
            }
            return free.value(x, xi) + decay * wallValue(x, xi);
        }

        /** The wall terms at (x, ξ), without E. */
        private double wallValue(double x, double xi) {
            final double img = image(x, xi);
            if (!zeroFlux) {
                return -img;
            }
            return img - halfVOverD() * erfcTerm(x, xi);
        }

        @Override
        public double valueAtOffset(double x, double s) {
            if (collapsed) {
                return free.valueAtOffset(x, s);
            }
            final double xi = free.origin(x) + s;
            if (!zeroFlux) {
                return free.valueAtOffset(x, s) * -Math.expm1(-q(x, xi));
            }
            return free.valueAtOffset(x, s) + decay * wallValue(x, xi);
        }

        @Override
        public double gradient(double x, double xi) {
            if (collapsed) {
                return 0.0;
            }
            if (!zeroFlux) {
                // ∂/∂x [G₀(1 − e^{−q})] = ∂G₀/∂x·(1 − e^{−q}) + G₀·(4ξ/L²)·e^{−q}
                final double q = q(x, xi);
                return free.gradient(x, xi) * -Math.expm1(-q)
                    + free.value(x, xi) * 4 * invWidth * free.scale(xi) * Math.exp(-q);
            }
            final double img = image(x, xi);
            // ∂I/∂x = −2(x − vt/R + ξ)/L² · I,  (x − vt/R + ξ)/L = y + 2ξ/L
            final double ix = -2 * invWidth * (free.scaled(x, xi) + 2 * free.scale(xi)) * img;
            // ∂T/∂x = (v/D)·T − 2I (T = e^{vx/D}erfc z; 2I = (2/(L√π))e^{vx/D − z²})
            final double tx = vOverD() * erfcTerm(x, xi) - 2 * img;
            return free.gradient(x, xi) + decay * (ix - halfVOverD() * tx);
        }

        @Override
        public double linear(double x, double a, double b, double fa, double fb) {
            if (!(b > a)) {
                return 0.0;
            }
            final double f = free.linear(x, a, b, fa, fb);
            if (collapsed) {
                return f;
            }
            return f + decay * wallLinear(x, a, b, fa, fb);
        }

        /** The wall terms of {@link #linear}, without E. */
        double wallLinear(double x, double a, double b, double fa, double fb) {
            final double img = imageLinear(x, a, b, fa, fb);
            if (!zeroFlux) {
                return -img;
            }
            return img - halfVOverD() * erfcLinear(x, a, b, fa, fb);
        }

        @Override
        public double linearGradient(double x, double a, double b, double fa, double fb) {
            if (!(b > a) || collapsed) {
                return 0.0;
            }
            final double f = free.linearGradient(x, a, b, fa, fb);
            // ∫φ ∂I/∂x = [φI]ₐᵇ − φ′∫I + (v/D)∫φI   (∂I/∂x = ∂I/∂ξ + (v/D)·I)
            final double imgLin = imageLinear(x, a, b, fa, fb);
            double ix = fb * image(x, b) - fa * image(x, a) + vOverD() * imgLin;
            if (fa != fb) {
                ix -= (fb - fa) / (b - a) * imageLinear(x, a, b, 1.0, 1.0);
            }
            if (!zeroFlux) {
                return f - decay * ix;
            }
            // ∫φ ∂T/∂x = (v/D)∫φT − 2∫φI
            final double tx = vOverD() * erfcLinear(x, a, b, fa, fb) - 2 * imgLin;
            return f + decay * (ix - halfVOverD() * tx);
        }

        @Override
        public double below(double x, double a) {
            return a > 0 ? linear(x, 0.0, a, 1.0, 1.0) : 0.0;
        }

        @Override
        public double above(double x, double b) {
            final double f = free.above(x, b);
            if (collapsed) {
                return f;
            }
            final double img = imageTail(x, b);
            if (!zeroFlux) {
                return f - decay * img;
            }
            return f + decay * (img - halfVOverD() * erfcTail(x, b));
        }

        /** The wall terms of {@link #above}, without E (the kernel not collapsed). */
        double wallAbove(double x, double b) {
            final double img = imageTail(x, b);
            if (!zeroFlux) {
                return -img;
            }
            return img - halfVOverD() * erfcTail(x, b);
        }

        @Override
        public double belowGradient(double x, double a) {
            return a > 0 ? linearGradient(x, 0.0, a, 1.0, 1.0) : 0.0;
        }

        @Override
        public double aboveGradient(double x, double b) {
            if (collapsed) {
                return 0.0;
            }
            final double f = free.aboveGradient(x, b);
            // ∫_b^∞ ∂I/∂x = −I(b) + (v/D)∫_b^∞ I
            final double imgTail = imageTail(x, b);
            final double ix = -image(x, b) + vOverD() * imgTail;
            if (!zeroFlux) {
                return f - decay * ix;
            }
            final double tx = vOverD() * erfcTail(x, b) - 2 * imgTail;
            return f + decay * (ix - halfVOverD() * tx);
        }
    }
}
