/**
 * Temporal and spatial moments (mass, mean, variance) of concentration curves: analytic for
 * the families with published or derivable closed forms, numerical for data
 * ({@link org.advecta.moments.Moments}).
 */
package org.advecta.moments;
