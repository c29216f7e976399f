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

    /**
     * Returns a spread that carries only 1/L = √(R/(4Dt)), for solutions that need nothing
     * else (the step and the slug on the line: erfc and erf differences of scaled distances).
     * Building the full spread costs those solutions about a tenth of their time, measured
     * by interleaved timing against the plain formula; this one costs one multiplication, one
     * division and one square root. 1/L is within 1 ulp (4Dt rounded once, R/(4Dt) once, the
     * square root once), as for {@link #of}, though not always the same double. Its exponent
     * parts and normalisation are NaN, so that a use of them shows.
     *
     * @param d dispersion coefficient, &gt; 0
     * @param r retardation factor, ≥ 1
     * @param t time, &gt; 0
     * @return the spread
     */
    public static Spread ofInverseLength(double d, double r, double t) {
        return new Spread(inverseLength(d, r, t));
    }

    /**
     * Returns 1/L = √(R/(4Dt)) within 1 ulp, without building a spread: the value
     * {@link #ofInverseLength} holds, bit for bit.
     *
     * @param d dispersion coefficient, &gt; 0
     * @param r retardation factor, ≥ 1
     * @param t time, &gt; 0
     * @return the inverse length
     */
    public static double inverseLength(double d, double r, double t) {
        return Math.sqrt(r / (4 * d * t));
    }

    private Spread(double inverseLength) {
        this.high = Double.NaN;
        this.low = Double.NaN;
        this.norm = Double.NaN;
        this.collapsed = !(inverseLength <= 1 / Math.sqrt(COLLAPSE));
        this.inverseLength = inverseLength;
    }

    /**
     * R/(p + pLow) in double-double, with one division and one square root (every solution
     * evaluation builds one): h = R·(1/p) need not be correctly rounded, because the fma
     * remainder R − h·p is exact for any h near R/p and carries the rest into the low part.
     */
    private Spread(double p, double pLow, double r) {
        final double invP = 1 / p;
        final double h = r * invP;
        final double rem = Math.fma(-h, p, r);
        // p/R ≥ 2⁻⁶⁰⁰ ⟺ R/p ≤ 2⁶⁰⁰ for positive p and R (false for NaN)
        this.collapsed = !(h <= 1 / COLLAPSE);
        this.high = h;
        this.low = (rem - h * pLow) * invP;
        // 1/L = √(R/(4Dt)) from the leading part alone, within 1 ulp: adding the low part
        // first would lengthen the chain of dependent operations before every erfc
        final double s = Math.sqrt(h);
        this.norm = s * ONE_OVER_SQRT_PI;
        this.inverseLength = s;
    }

    /** 1/√π. */
    private static final double ONE_OVER_SQRT_PI = 0.5641895835477563;

    /** √(R/(4Dt)) = 1/L, rounded. */
    private final double inverseLength;

    /**
     * Returns ξ/L = ξ·√(R/(4Dt)), within 3/2 ulp.
     *
     * <p>Why not in double-double, as the exponents are: a scaled distance w enters the
     * solutions as erfc(w) or exp(−w²), whose relative error from a relative error δ in w is
     * about 2w²δ; their condition number with respect to D alone is already w², so the
     * 3/2-ulp w costs at most 3/2 of the 2κ-ULP contract's own budget, while carrying 1/L in
     * double-double costs a division and a chain of dependent operations on every
     * evaluation (about a sixth of a step solution's time). The reference fixtures measure
     * the result (README's accuracy table).
     *
     * @param xi a distance
     * @return the scaled distance
     */
    public double scaled(double xi) {
        return xi * inverseLength;
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
     * Returns the centre x₀ + (v/R)·t as a double-double {high, low}, so that distances from
     * it carry no rounding of the drift (which would cost κ·2⁻⁵³ relative in the far tails,
     * where κ ≈ 2·ξ²R/(4Dt) reaches 1e3 and more).
     *
     * @param x0 the release point
     * @param v velocity
     * @param r retardation
     * @param t time
     * @return {high, low}
     */
    public static double[] centre(double x0, double v, double r, double t) {
        // v/R in double-double, times t in double-double, plus x0 by two-sum
        final double q = v / r;
        final double qLow = Math.fma(-q, r, v) / r;
        final double d = q * t;
        final double dLow = Math.fma(q, t, -d) + qLow * t;
        final double c = x0 + d;
        final double bv = c - x0;
        final double err = (x0 - (c - bv)) + (d - bv);
        final double low = err + dLow;
        final double high = c + low;
        return new double[] {high, low - (high - c)};
    }

    /**
     * Returns the leading part of ξ²·R/(4Dt) for ξ = x − (cHigh + cLow) carried exactly.
     *
     * @param x the position
     * @param cHigh leading part of the centre
     * @param cLow trailing part of the centre
     * @return the leading part of the exponent
     */
    public double exponentHigh(double x, double cHigh, double cLow) {
        final double xi = x - cHigh;
        final double xiLow = twoDiffError(x, cHigh, xi) - cLow;
        final double h = xi + xiLow;
        return h * h * high;
    }

    /**
     * Returns the trailing part of ξ²·R/(4Dt) for ξ = x − (cHigh + cLow), given the leading
     * part from {@link #exponentHigh(double, double, double)}.
     *
     * @param x the position
     * @param cHigh leading part of the centre
     * @param cLow trailing part of the centre
     * @param qHigh the leading part
     * @return the trailing part
     */
    public double exponentLow(double x, double cHigh, double cLow, double qHigh) {
        final double xi = x - cHigh;
        final double xiLow = twoDiffError(x, cHigh, xi) - cLow;
        final double h = xi + xiLow;
        final double l = xiLow - (h - xi);
        final double p = h * h;
        final double pLow = Math.fma(h, h, -p) + 2 * h * l;
        return Math.fma(p, high, -qHigh) + (p * low + pLow * high);
    }

    /**
     * Returns the decay exponent −μt/R as a double-double {high, low}: its rounding would
     * cost |μt/R|·2⁻⁵³ relative, hundreds of units in the subnormal range.
     *
     * @param mu decay coefficient
     * @param r retardation
     * @param t time
     * @return {high, low}
     */
    public static double[] decay(double mu, double r, double t) {
        final double p = mu * t;
        final double pLow = Math.fma(mu, t, -p);
        final double q = p / r;
        final double qLow = (Math.fma(-q, r, p) + pLow) / r;
        return new double[] {-q, -qLow};
    }

    /** The exact error of the rounded difference d = a − b (Knuth's two-sum). */
    private static double twoDiffError(double a, double b, double d) {
        final double bv = d - a;
        return (a - (d - bv)) + (-b - bv);
    }

    /**
     * Returns m·exp(s − qx − qy) for exponent parts given as double-doubles.
     *
     * @param m finite multiplier
     * @param s finite shift
     * @param hx leading part of qx
     * @param lx trailing part of qx
     * @param hy leading part of qy
     * @param ly trailing part of qy
     * @return the product
     */
    public static double combine(double m, double s, double hx, double lx, double hy,
                                 double ly) {
        final double h = hx + hy;
        final double bv = h - hx;
        final double err = (hx - (h - bv)) + (hy - bv);
        return ScaledExp.valueOfSplit(m, s, h, err + lx + ly);
    }

    /**
     * Returns m·exp(s − qx − qy − qz) for exponent parts given as double-doubles.
     *
     * @param m finite multiplier
     * @param s finite shift
     * @param hx leading part of qx
     * @param lx trailing part of qx
     * @param hy leading part of qy
     * @param ly trailing part of qy
     * @param hz leading part of qz
     * @param lz trailing part of qz
     * @return the product
     */
    public static double combine(double m, double s, double hx, double lx, double hy,
                                 double ly, double hz, double lz) {
        final double h1 = hx + hy;
        double bv = h1 - hx;
        double err = (hx - (h1 - bv)) + (hy - bv);
        final double h = h1 + hz;
        bv = h - h1;
        err += (h1 - (h - bv)) + (hz - bv);
        return ScaledExp.valueOfSplit(m, s, h, err + lx + ly + lz);
    }
}
