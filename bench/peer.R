# Benchmark peer of the demo's calibration sections, in plain R (base R and readxl only).
#
# What it reproduces: the two calibration cells of demo-data/hmf-honey-validation.md, "linearity"
# (weighting: auto, straight line with intercept) and "unweighted-check" (weighting: none), on the
# block Calibration!A8:F31 with the failed injection Calibration!D23 excluded from both fits. For
# each it fits the line, computes what the calibration section reports (slope and intercept with
# SE and 95 % CI, t test of the intercept, r, r², s(y/x), regression ANOVA F, lack-of-fit F against
# pure error, Mandel's test of the quadratic term, Shapiro-Wilk of the standardized residuals,
# back-calculated standards) and draws the section's three figures (fit with 95 % confidence and
# prediction bands, standardized residuals, % deviation of the back-calculated standards), six
# pages in all, into one PDF.
#
# It is a benchmark peer, not a reference implementation: it exists so that bench/peer.sh can time
# the same core work done the way an analyst would do it in R (lm, anova, predict, shapiro.test,
# base graphics) beside meritbook's cold run, and check that both give the same numbers. It writes
# no dossier, no trail and no results.json, and it knows this one workbook's layout.
#
# Usage: Rscript bench/peer.R WORKBOOK.xlsx OUT.pdf
# Prints one line per number, "section quantity value" (value with 17 significant digits).

suppressPackageStartupMessages(library(readxl))

args <- commandArgs(trailingOnly = TRUE)
if (length(args) != 2) {
  stop("usage: Rscript bench/peer.R WORKBOOK.xlsx OUT.pdf", call. = FALSE)
}
workbook <- args[1]
pdf_file <- args[2]

# The block as the notebook cites it; header in row 8, so data row i is sheet row 8 + i.
block_first_row <- 8
block <- read_excel(workbook, sheet = "Calibration", range = "A8:F31")
# D16 is a number stored as text, so readxl reads the column as text; every other entry is a number.
area <- suppressWarnings(as.numeric(block[["Peak area (mAU·s)"]]))
nominal <- as.numeric(block[["Nominal (mg/L)"]])
sheet_row <- block_first_row + seq_len(nrow(block))
present <- !is.na(area) & !is.na(nominal)          # drops the blank row 21
excluded_rows <- c(23)                               # Calibration!D23: air bubble, reinjected
used <- present & !(sheet_row %in% excluded_rows)
left_out <- present & (sheet_row %in% excluded_rows)
x <- nominal[used]
y <- area[used]
x_excluded <- nominal[left_out]
y_excluded <- area[left_out]

# Weights 1/basis^k, scaled to average 1 over the points in the fit (as meritbook reports them).
raw_weights <- function(weighting, x, y) {
  switch(weighting,
         "none" = rep(1, length(x)),
         "1/x" = 1 / x, "1/x^2" = 1 / x^2,
         "1/y" = 1 / y, "1/y^2" = 1 / y^2)
}

fit_line <- function(weighting) {
  raw <- raw_weights(weighting, x, y)
  w <- raw / mean(raw)
  list(weighting = weighting, raw = raw, w = w, lm = lm(y ~ x, weights = w))
}

back_calculate <- function(fit, response) {
  b <- coef(fit$lm)
  (response - b[[1]]) / b[[2]]
}

# weighting: auto keeps the weighting whose back-calculated standards deviate least in total.
sum_abs_deviation <- function(fit) {
  keep <- x != 0
  sum(abs((back_calculate(fit, y[keep]) - x[keep]) / x[keep] * 100))
}
candidates <- c("none", "1/x", "1/x^2", "1/y", "1/y^2")
auto_fits <- lapply(candidates, fit_line)
auto_sums <- vapply(auto_fits, sum_abs_deviation, numeric(1))
chosen <- candidates[which.min(auto_sums)]

out <- function(section, name, value) {
  cat(section, " ", name, " ", sprintf("%.17g", value), "\n", sep = "")
}

report <- function(section, fit) {
  model <- fit$lm
  s <- summary(model)
  co <- s$coefficients
  n <- length(x)
  t95 <- qt(0.975, model$df.residual)
  pure_error <- lm(y ~ factor(x), weights = fit$w)
  lack_of_fit <- anova(model, pure_error)
  quadratic <- lm(y ~ x + I(x^2), weights = fit$w)
  mandel <- anova(model, quadratic)
  standardized <- weighted.residuals(model) / s$sigma
  shapiro <- shapiro.test(standardized)
  fstat <- s$fstatistic
  out(section, "n", n)
  out(section, "slope", co["x", "Estimate"])
  out(section, "slope_se", co["x", "Std. Error"])
  out(section, "slope_ci_low", co["x", "Estimate"] - t95 * co["x", "Std. Error"])
  out(section, "slope_ci_high", co["x", "Estimate"] + t95 * co["x", "Std. Error"])
  out(section, "intercept", co["(Intercept)", "Estimate"])
  out(section, "intercept_se", co["(Intercept)", "Std. Error"])
  out(section, "intercept_t", co["(Intercept)", "t value"])
  out(section, "intercept_p", co["(Intercept)", "Pr(>|t|)"])
  out(section, "r", sign(co["x", "Estimate"]) * sqrt(s$r.squared))
  out(section, "r_squared", s$r.squared)
  out(section, "residual_sd", s$sigma)
  out(section, "anova_regression_f", fstat[["value"]])
  out(section, "lack_of_fit_f", lack_of_fit$F[2])
  out(section, "lack_of_fit_p", lack_of_fit$`Pr(>F)`[2])
  out(section, "mandel_f", mandel$F[2])
  out(section, "mandel_p", mandel$`Pr(>F)`[2])
  out(section, "shapiro_w", shapiro$statistic[["W"]])
  out(section, "shapiro_p", shapiro$p.value)
  standardized
}

# The three figures of a calibration section, one page each.
draw <- function(section, fit, standardized) {
  model <- fit$lm
  grid <- seq(min(x), max(x), length.out = 60)
  fitted_grid <- predict(model, data.frame(x = grid))
  # A new observation's weight on the scale of the calibration weights: the raw weight at x0
  # (1/ŷ0^k for y-based weighting) over the mean raw weight of the calibration points.
  basis <- if (startsWith(fit$weighting, "1/y")) fitted_grid else grid
  w0 <- raw_weights(fit$weighting, basis, basis) / mean(fit$raw)
  conf <- predict(model, data.frame(x = grid), interval = "confidence", level = 0.95)
  pred <- predict(model, data.frame(x = grid), interval = "prediction", level = 0.95, weights = w0)
  plot(x, y, pch = 19, xlab = "Nominal (mg/L)", ylab = "Peak area (mAU·s)",
       ylim = range(y, y_excluded, pred[, 2:3]),
       main = paste0(section, ": standards, fitted line and 95 % bands"))
  points(x_excluded, y_excluded, pch = 4, col = "red")
  lines(grid, fitted_grid)
  matlines(grid, conf[, 2:3], lty = 2, col = "blue")
  matlines(grid, pred[, 2:3], lty = 3, col = "darkgreen")
  legend("topleft", bty = "n", lty = c(NA, NA, 1, 2, 3), pch = c(19, 4, NA, NA, NA),
         col = c("black", "red", "black", "blue", "darkgreen"),
         legend = c("Standards", "Excluded (see reasons)", "Fitted line", "95 % confidence band",
                    "95 % prediction band"))

  plot(x, standardized, pch = 19, xlab = "Nominal (mg/L)", ylab = "Standardized residual e·sqrt(w) / s(y/x)",
       ylim = range(standardized, -3, 3),
       main = paste0(section, ": standardized residuals against concentration"))
  abline(h = 0, col = "grey40")
  abline(h = c(-3, 3), lty = 3)

  keep <- x != 0
  deviation <- (back_calculate(fit, y[keep]) - x[keep]) / x[keep] * 100
  deviation_excluded <- (back_calculate(fit, y_excluded) - x_excluded) / x_excluded * 100
  plot(x[keep], deviation, pch = 19, xlab = "Nominal (mg/L)", ylab = "Deviation (%)",
       ylim = range(deviation, deviation_excluded, -15, 15) * c(1, 1.8),   # head room for the legend
       main = paste0(section, ": back-calculated concentration, % deviation from nominal"))
  points(x_excluded, deviation_excluded, pch = 4, col = "red")
  abline(h = 0, col = "grey40")
  abline(h = c(-15, 15), lty = 3)
  legend("topright", bty = "n", cex = 0.8, lty = c(NA, NA, 3), pch = c(19, 4, NA), col = c("black", "red", "black"),
         legend = c("Deviation of back-calculated standards", "Excluded (see reasons)",
                    "±15 % guide (common practice; the study's profile sets no deviation limit)"))
}

cat("linearity weighting ", chosen, "\n", sep = "")
for (i in seq_along(candidates)) {
  out("linearity", paste0("auto_sum_abs_deviation[", candidates[i], "]"), auto_sums[i])
}
reporting <- auto_fits[[which.min(auto_sums)]]
check <- fit_line("none")
z_reporting <- report("linearity", reporting)
z_check <- report("unweighted-check", check)

pdf(pdf_file, width = 7, height = 5)
par(cex.main = 0.9)
draw("linearity", reporting, z_reporting)
draw("unweighted-check", check, z_check)
invisible(dev.off())
