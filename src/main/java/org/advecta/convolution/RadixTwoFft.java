package org.advecta.convolution;

/**
 * An in-place iterative radix-2 complex FFT (Cooley &amp; Tukey 1965, Math. Comp. 19,
 * 297–301): bit-reversal permutation, then log₂M passes of butterflies, with the twiddle
 * factors exp(−2πik/M) taken from Math.cos and Math.sin of the rounded angle (each within a
 * few units of 2⁻⁵³, so the transform's error is bounded as in Higham 2002, <i>Accuracy and
 * Stability of Numerical Algorithms</i>, 2nd ed., Thm 24.2). Package-private engine of the
 * grid convolution; one instance per transform length, immutable after construction.
 */
final class RadixTwoFft {

    private final int size;
    private final int bits;
    private final double[] cos;
    private final double[] sin;

    /**
     * Prepares transforms of length size.
     *
     * @param size a power of two, ≥ 2
     */
    RadixTwoFft(int size) {
        if (size < 2 || Integer.bitCount(size) != 1) {
            throw new IllegalArgumentException("size: must be a power of two >= 2, got " + size);
        }
        this.size = size;
        this.bits = Integer.numberOfTrailingZeros(size);
        final int half = size / 2;
        this.cos = new double[half];
        this.sin = new double[half];
        for (int k = 0; k < half; k++) {
            final double angle = 2 * Math.PI * k / size;
            cos[k] = Math.cos(angle);
            sin[k] = -Math.sin(angle);
        }
    }

    /**
     * Returns log₂ of the length.
     *
     * @return the number of butterfly passes
     */
    int passes() {
        return bits;
    }

    /**
     * Replaces (re, im) by its forward transform Σ z_n exp(−2πikn/M) (no scaling).
     *
     * @param re real parts, length M; overwritten
     * @param im imaginary parts, length M; overwritten
     */
    void forward(double[] re, double[] im) {
        final int n = size;
        final int shift = 32 - bits;
        for (int i = 0; i < n; i++) {
            final int j = Integer.reverse(i) >>> shift;
            if (j > i) {
                double tmp = re[i];
                re[i] = re[j];
                re[j] = tmp;
                tmp = im[i];
                im[i] = im[j];
                im[j] = tmp;
            }
        }
        for (int len = 2; len <= n; len <<= 1) {
            final int half = len >>> 1;
            final int step = n / len;
            for (int start = 0; start < n; start += len) {
                for (int j = 0, k = 0; j < half; j++, k += step) {
                    final double wr = cos[k];
                    final double wi = sin[k];
                    final int p = start + j;
                    final int q = p + half;
                    final double xr = re[q] * wr - im[q] * wi;
                    final double xi = re[q] * wi + im[q] * wr;
                    final double ur = re[p];
                    final double ui = im[p];
                    re[p] = ur + xr;
                    im[p] = ui + xi;
                    re[q] = ur - xr;
                    im[q] = ui - xi;
                }
            }
        }
    }
}
