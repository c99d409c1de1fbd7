# Reference values for the demo notebook's limits-solution cell, through the 1/y²-weighted line weighting: auto keeps (R 4.x, base stats: lm with weights, qt, sd,
# uniroot). Data: demo workbook sheets Calibration (D23 excluded), Blanks and SignalNoise (invented data).
options(digits = 15)
x <- c(rep(0.1, 3), rep(0.25, 3), rep(0.5, 3), rep(1, 3), rep(2.5, 3), rep(5, 3), rep(10, 3))
y <- c(4.6, 4.44, 4.66, 10.68, 10.62, 10.9, 21.67, 21.08, 21.04, 40.74, 41.07, 41.88,
       103.94, 105.87, 104.8, 211.37, 207.3, 210.5, 409.23, 416.92, 425.9)
w <- (1 / y^2) / mean(1 / y^2)
f <- lm(y ~ x, weights = w); a <- coef(f)[[1]]; b <- coef(f)[[2]]; s <- summary(f)$sigma
yb <- c(0.3, 0.39, 0.56, 0.33, 0.27, 0.39, 0.36, 0.25, 0.4, 0.51)
cat("a", a, "b", b, "s(y/x)", s, "\n")
cat("blank LOD", (mean(yb) + 3 * sd(yb) - a) / b, "LOQ", (mean(yb) + 10 * sd(yb) - a) / b, "\n")
cat("response-sd LOD", 3.3 * s / b, "LOQ", 10 * s / b, "\n")
xbw <- sum(w * x) / sum(w); sxx <- sum(w * (x - xbw)^2); t <- qt(0.95, length(x) - 2)
wat <- function(x0) (1 / (a + b * x0)^2) / mean(1 / y^2)
h <- function(x0, w0) sqrt(1 / w0 + 1 / sum(w) + (x0 - xbw)^2 / sxx)
rise <- t * s * h(0, wat(0))
xD <- uniroot(function(x0) b * x0 - t * s * h(x0, wat(x0)) - rise, c(rise / b, 10), tol = 1e-14)$root
cat("xC", rise / b, "xD", xD, "\n")
