/**
 * The sampling distributions the figures of merit need, as small immutable types over Apache
 * Commons Math 3.6.1: {@link org.meritbook.stats.distributions.StudentT}, {@link
 * org.meritbook.stats.distributions.FisherF}, {@link org.meritbook.stats.distributions.ChiSquared} and
 * {@link org.meritbook.stats.distributions.StandardNormal}.
 *
 * <p>Why a layer over Commons Math: one place fixes the quantile accuracy (10⁻¹³ absolute, where
 * Commons Math's default for t is 10⁻⁹), computes upper tails directly from the regularized
 * incomplete beta and gamma functions instead of as 1 − cdf (which cancels for small p), takes
 * upper quantiles of the symmetric distributions by symmetry from the accurate lower tail, and
 * checks its arguments with the statistics tree's own wording. Each type names the parameter
 * convention it uses: {@code quantile(p)} is always the lower-tail quantile, P(X ≤ q) = p.
 */
package org.meritbook.stats.distributions;
