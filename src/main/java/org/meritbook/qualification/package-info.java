/**
 * The tool's own qualification ({@code meritbook qualify}): NIST StRD certified values recomputed on
 * the machine where meritbook runs by the calibration fits (linear least squares), the mean and SD
 * (univariate summary statistics) and the one-way ANOVA (precision). The NIST files ship unchanged
 * as resources, read by {@link org.meritbook.qualification.NistDataset}, {@link
 * org.meritbook.qualification.NistUnivariateDataset} and {@link
 * org.meritbook.qualification.NistAnovaDataset}; the stats tests use the same readers.
 */
package org.meritbook.qualification;
