/**
 * Descriptive statistics of one sample: the accurate mean and sum of squared deviations
 * ({@link org.meritbook.stats.descriptive.Moments}, shared with the ANOVA) and the summary a
 * precision or accuracy section prints ({@link org.meritbook.stats.descriptive.SampleSummary}: n,
 * mean, SD, %CV, the t interval of the mean and the chi-square interval of the SD).
 *
 * <p>Accuracy is measured against NIST StRD univariate data (Michelso, Mavro, NumAcc1–4, Lew,
 * Lottery, PiDigits); the digits reached are stated in {@code SampleSummary}.
 */
package org.meritbook.stats.descriptive;
