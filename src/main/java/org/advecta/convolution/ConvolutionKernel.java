package org.advecta.convolution;

import org.advecta.solution.Domain;
import org.advecta.transport.TransportParameters;

/**
 * A Green's function G(x, ξ, t) of {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c} on a domain,
 * with the exact integrals of piecewise-linear data against it: the solution for initial
 * data φ is c(x, t) = ∫ φ(ξ)·G(x, ξ, t) dξ over the domain.
 *
 * <p>This is the extension point of the convolution routes: {@link InfiniteLineKernel} is
 * the free-space kernel of the whole line; {@link HalfLineKernel} (absorbing or zero-flux
 * wall at x = 0) is the free-space kernel plus images with the same segment integrals, and
 * every route of
 * {@link ProfileConvolution} and {@link FunctionConvolution} then works on it unchanged
 * (the fast uniform-grid path needs translation invariance and stays on the line).
 *
 * <p>Implementations are immutable and thread-safe.
 */
public interface ConvolutionKernel {

    /**
     * Returns the transport parameters.
     *
     * @return v, D, R, μ
     */
    TransportParameters parameters();

    /**
     * Returns where x and ξ live.
     *
     * @return the domain
     */
    Domain domain();

    /**
     * Returns the kernel at one time, with its time-dependent constants computed once.
     *
     * @param t time, finite and ≥ 0
     * @return the snapshot
     * @throws IllegalArgumentException if t is invalid
     */
    Snapshot at(double t);

    /**
     * The kernel at one time t. Its methods do not validate x and ξ (callers do); they
     * allocate nothing.
     */
    interface Snapshot {

        /**
         * Returns true when the kernel has no resolvable width (t = 0, or a spread far
         * below any length a double resolves): the solution is then decay × φ at the point
         * the flow carried to x, see {@link #origin(double)}.
         *
         * @return whether the kernel is a Dirac delta
         */
        boolean collapsed();

        /**
         * Returns true if G depends on x − ξ alone (so ∂G/∂x = −∂G/∂ξ): the gradient of a
         * profile is then summed from its slopes and jumps, each term separately, which
         * avoids the cancellation of per-segment end terms.
         *
         * @return whether the kernel is translation invariant
         */
        boolean translationInvariant();

        /**
         * Returns the factor exp(−μt/R) by which the total mass has decayed.
         *
         * @return the decay factor
         */
        double decay();

        /**
         * Returns the point ξ around which G(x, ·, t) is concentrated (x − vt/R on the
         * line).
         *
         * @param x position
         * @return the centre in ξ
         */
        double origin(double x);

        /**
         * Returns the length scale L of G in ξ (√(4Dt/R) on the line; 0 when collapsed).
         * G(x, ξ, t) is below exp(−Y²)·decay/(L√π) where |ξ − origin(x)| &gt; Y·L.
         *
         * @return L
         */
        double width();

        /**
         * Returns G(x, ξ, t).
         *
         * @param x position
         * @param xi source point
         * @return the kernel's value
         */
        double value(double x, double xi);

        /**
         * Returns G(x, ξ, t) at ξ = origin(x) + s, the offset s taken exactly (not rounded
         * into ξ): quadrature in s then resolves a kernel far narrower than the spacing of
         * doubles near ξ would allow.
         *
         * @param x position
         * @param s offset of ξ from {@link #origin(double)}
         * @return the kernel's value
         */
        double valueAtOffset(double x, double s);

        /**
         * Returns ∂G/∂x at (x, ξ, t).
         *
         * @param x position
         * @param xi source point
         * @return the kernel's x-derivative
         */
        double gradient(double x, double xi);

        /**
         * Returns ∫ φ(ξ)·G(x, ξ, t) dξ over [a, b] for the linear φ with φ(a) = fa, φ(b) = fb.
         *
         * @param x position
         * @param a left end
         * @param b right end, ≥ a (a = b gives 0)
         * @param fa φ(a)
         * @param fb φ(b)
         * @return the integral
         */
        double linear(double x, double a, double b, double fa, double fb);

        /**
         * Returns ∫ φ(ξ)·∂G/∂x dξ over [a, b] for the same linear φ.
         *
         * @param x position
         * @param a left end
         * @param b right end, ≥ a
         * @param fa φ(a)
         * @param fb φ(b)
         * @return the integral
         */
        double linearGradient(double x, double a, double b, double fa, double fb);

        /**
         * Returns ∫ G(x, ξ, t) dξ over the part of the domain below a.
         *
         * @param x position
         * @param a upper end
         * @return the integral
         */
        double below(double x, double a);

        /**
         * Returns ∫ G(x, ξ, t) dξ over ξ &gt; b.
         *
         * @param x position
         * @param b lower end
         * @return the integral
         */
        double above(double x, double b);

        /**
         * Returns ∫ ∂G/∂x dξ over the part of the domain below a.
         *
         * @param x position
         * @param a upper end
         * @return the integral
         */
        double belowGradient(double x, double a);

        /**
         * Returns ∫ ∂G/∂x dξ over ξ &gt; b.
         *
         * @param x position
         * @param b lower end
         * @return the integral
         */
        double aboveGradient(double x, double b);
    }
}
