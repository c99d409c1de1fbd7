# Reference values for AccuracyAnalysisTest: an invented set of results against known values
# (no unspiked portions); level 100 has one result only.
# Run: Rscript known-recovery.R   (R 4.x; mean, sd, t.test)
known    <- c(10, 10, 10, 10, 50, 50, 50, 100)
measured <- c(9.7, 10.2, 9.9, 10.4, 48.6, 50.9, 49.3, 101.5)
recovery <- measured / known * 100
report <- function(name, r) {
  t <- t.test(r, mu = 100, conf.level = 0.95)
  cat(sprintf("%-7s n=%d mean=%.15g sd=%.15g ci_low=%.15g ci_high=%.15g p=%.15g\n",
              name, length(r), mean(r), sd(r), t$conf.int[1], t$conf.int[2], t$p.value))
}
report("10", recovery[known == 10])
report("50", recovery[known == 50])
report("overall", recovery)
cat(sprintf("100     n=1 recovery=%.15g\n", recovery[known == 100]))
