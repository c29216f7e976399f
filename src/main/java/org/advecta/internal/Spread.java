package org.advecta.internal;

/**
 * The spread of a drifting Gaussian along one axis at one time t &gt; 0: the exponent factor
 * R/(4 D t), held as an unevaluated double-double sum so that ξ²·R/(4Dt) carries no more
 * than a few units of rounding whatever its size, and the normalisation √(R/(4π D t)).
 *
 * <p>Not exported from the module.
 *
 * <p>Why double-double: the kernel's relative error from a relative error δ in its exponent
 * q = ξ²R/(4Dt) is q·δ, and q reaches 745 before the kernel underflows. A plainly rounded
 * q (four roundings) costs up to 4q/2 ≈ 1500 ULP there; the split keeps it to about q·2⁻¹⁰⁰.
 */
public final class Spread {

    /** Leading part of R/(4 D t). */
    public final double high;
    /** Trailing part of R/(4 D t). */
    public final double low;
    /** √(R/(4π D t)), the one-axis normalisation. */
    public final double norm;
    /**
     * True when 4Dt/R is below {@link #COLLAPSE} = 2⁻⁶⁰⁰ ≈ 2.4e-181: the spread is then far
     * below any length a double near the centre can resolve, and the kernel takes its t → 0
     * limit. The threshold keeps the product of three normalisations (each at most
     * 2³⁰⁰/√π) finite.
     */
    public final boolean collapsed;

    /** The smallest 4Dt/R the kernels resolve; see {@link #collapsed}. */
    public static final double COLLAPSE = 0x1.0p-600;

    /**
     * Returns the spread of a kernel with dispersion d and retardation r at time t.
     *
     * @param d dispersion coefficient, &gt; 0
     * @param r retardation factor, ≥ 1
     * @param t time, &gt; 0
     * @return the spread
     */
    public static Spread of(double d, double r, double t) {
        // 4Dt exactly as p + pLow (scaling by 4 is exact), then R/(p + pLow) in double-double.
        final double fourD = 4 * d;
        final double p = fourD * t;
        return new Spread(p, Math.fma(fourD, t, -p), r);
    }

    /**
     * Returns the spread whose "4Dt/R" (twice the variance) is the double-double
     * (twiceVariance + twiceVarianceLow), for kernels whose variance is not 2Dt/R (an initial
     * Gaussian of width s₀ has 2s₀² + 4Dt/R).
     *
     * @param twiceVariance leading part, &gt; 0
     * @param twiceVarianceLow trailing part
     * @return the spread
     */
    public static Spread ofTwiceVariance(double twiceVariance, double twiceVarianceLow) {
        return new Spread(twiceVariance, twiceVarianceLow, 1.0);
    }

    /** R/(p + pLow) in double-double. */
    private Spread(double p, double pLow, double r) {
        final double h = r / p;
        final double rem = Math.fma(-h, p, r);
        this.collapsed = !(p / r >= COLLAPSE);
        this.high = h;
        this.low = (rem - h * pLow) / p;
        this.norm = Math.sqrt(h / Math.PI);
        // √(high + low) = √(R/(4Dt)) = 1/L in double-double, for scaled distances ξ/L
        final double s = Math.sqrt(h);
        this.inverseLength = s;
        this.inverseLengthLow = (Math.fma(-s, s, h) + this.low) / (2 * s);
    }

    /** Leading part of √(R/(4Dt)) = 1/L. */
    private final double inverseLength;
    /** Trailing part of 1/L. */
    private final double inverseLengthLow;

    /**
     * Returns ξ/L = ξ·√(R/(4Dt)) rounded once (the length carried in double-double).
     *
     * @param xi a distance
     * @return the scaled distance
     */
    public double scaled(double xi) {
        return Math.fma(xi, inverseLength, xi * inverseLengthLow);
    }

    /**
     * Returns 1/L = √(R/(4Dt)), rounded.
     *
     * @return the inverse length
     */
    public double inverseLength() {
        return inverseLength;
    }

    /**
     * Returns the leading part of ξ²·R/(4Dt).
     *
     * @param xi the distance from the centre
     * @return the leading part
     */
    public double exponentHigh(double xi) {
        return xi * xi * high;
    }

    /**
     * Returns the trailing part of ξ²·R/(4Dt), given the leading part.
     *
     * @param xi the distance from the centre
     * @param qHigh the value of {@link #exponentHigh(double)} for the same ξ
     * @return the trailing part
     */
    public double exponentLow(double xi, double qHigh) {
        final double p = xi * xi;
        final double pLow = Math.fma(xi, xi, -p);
        return Math.fma(p, high, -qHigh) + (p * low + pLow * high);
    }

    /**
     * Returns m·exp(s − qx − qy) with qx = ξ²R/(4D_x t), qy = η²R/(4D_y t), the exponent
     * summed in double-double.
     *
     * @param m finite multiplier
     * @param s finite shift
     * @param sx spread along x
     * @param xi distance from the centre along x
     * @param sy spread along y
     * @param eta distance from the centre along y
     * @return the product
     */
    public static double gaussian(double m, double s, Spread sx, double xi, Spread sy, double eta) {
        final double hx = sx.exponentHigh(xi);
        final double hy = sy.exponentHigh(eta);
        final double h = hx + hy;
        final double bv = h - hx;
        final double err = (hx - (h - bv)) + (hy - bv);
        return ScaledExp.valueOfSplit(m, s, h,
            err + sx.exponentLow(xi, hx) + sy.exponentLow(eta, hy));
    }

    /**
     * Returns m·exp(s − qx − qy − qz), the exponent summed in double-double.
     *
     * @param m finite multiplier
     * @param s finite shift
     * @param sx spread along x
     * @param xi distance from the centre along x
     * @param sy spread along y
     * @param eta distance from the centre along y
     * @param sz spread along z
     * @param zeta distance from the centre along z
     * @return the product
     */
    public static double gaussian(double m, double s, Spread sx, double xi, Spread sy, double eta,
                           Spread sz, double zeta) {
        final double hx = sx.exponentHigh(xi);
        final double hy = sy.exponentHigh(eta);
        final double hz = sz.exponentHigh(zeta);
        final double h1 = hx + hy;
        double bv = h1 - hx;
        double err = (hx - (h1 - bv)) + (hy - bv);
        final double h = h1 + hz;
        bv = h - h1;
        err += (h1 - (h - bv)) + (hz - bv);
        return ScaledExp.valueOfSplit(m, s, h, err + sx.exponentLow(xi, hx)
            + sy.exponentLow(eta, hy) + sz.exponentLow(zeta, hz));
    }
}
