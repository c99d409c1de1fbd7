# Reference values for AccuracyAnalysisTest: spike recovery of the demo workbook's sheet Spikes
# (A5:H23, values copied from demo-data/hmf-honey-validation.xlsx with Apache POI).
# Run: Rscript spike-recovery.R   (R 4.x; mean, sd, t.test)
level    <- rep(c("low", "mid", "high"), each = 6)
unspiked <- c(8.04, 8.39, 8.64, 8.94, 8.81, 8.80,  8.69, 8.61, 8.59, 8.77, 9.08, 8.13,
              8.88, 8.33, 8.50, 8.81, 8.88, 8.35)
added    <- rep(c(5, 20, 40), each = 6)
measured <- c(14.57, 12.99, 13.22, 13.48, 12.70, 14.36,  28.49, 28.47, 28.61, 27.97, 28.46, 29.66,
              50.55, 48.80, 48.92, 49.72, 49.41, 47.92)
recovery <- (measured - unspiked) / added * 100      # paired row by row
report <- function(name, r) {
  t <- t.test(r, mu = 100, conf.level = 0.95)
  cat(sprintf("%-7s n=%d mean=%.15g sd=%.15g ci_low=%.15g ci_high=%.15g p=%.15g error=%.15g\n",
              name, length(r), mean(r), sd(r), t$conf.int[1], t$conf.int[2], t$p.value, mean(r) - 100))
}
for (l in c("low", "mid", "high")) report(l, recovery[level == l])
report("overall", recovery)
