/**
 * Results of quadrature: {@link org.advecta.quadrature.Estimate}, a value with an estimate of
 * its absolute error, returned by the solutions that integrate numerically (continuous
 * sources, convolution of user data, Duhamel superposition of inlet histories).
 */
package org.advecta.quadrature;
