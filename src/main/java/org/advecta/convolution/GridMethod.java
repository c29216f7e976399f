package org.advecta.convolution;

/**
 * How {@link ProfileConvolution#valuesOnGrid} evaluates the convolution of uniform samples on
 * a uniform output grid of the same spacing. Beside a wall ({@link HalfLineKernel}) the method
 * applies to the free part; the wall terms, which reach only about 14 kernel widths of
 * outputs, are always a direct sum over the offsets within reach (see valuesOnGrid).
 */
public enum GridMethod {
    /**
     * The cheaper of the two by an operation count (window: N_out·K multiply-adds; FFT:
     * about 3·M·log₂M butterfly operations, M the padded length).
     */
    AUTOMATIC,
    /**
     * A direct sum over the K grid offsets whose hat functions reach within 6.5 kernel widths
     * (O(N·K)); its error is absolute, relative to max|f|·exp(−μt/R).
     */
    WINDOW,
    /**
     * Zero-padded radix-2 FFT convolution (O(M log M), M ≥ N + K − 1): its error is
     * absolute and grows with log₂M and the norms of the data.
     */
    FFT
}
