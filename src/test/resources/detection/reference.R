# Reference values for DetectionLimitAnalysisTest (R 4.x, base stats: lm, qt, sd, shapiro.test, uniroot).
options(digits = 15)
# Miller & Miller fluorescence calibration (handbook worked example, from memory).
x <- c(0, 2, 4, 6, 8, 10, 12); y <- c(2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7)
f <- lm(y ~ x); a <- coef(f)[[1]]; b <- coef(f)[[2]]; s <- summary(f)$sigma
sea <- summary(f)$coefficients[1, 2]
cat("blank-from-calibration LOD", 3 * s / b, "LOQ", 10 * s / b, "\n")
cat("response-sd residual LOD", 3.3 * s / b, "LOQ", 10 * s / b, "\n")
cat("response-sd intercept LOD", 3.3 * sea / b, "LOQ", 10 * sea / b, "\n")
n <- length(x); sxx <- sum((x - mean(x))^2); h0 <- sqrt(1 + 1 / n + mean(x)^2 / sxx)
tA <- qt(0.95, n - 2)
cat("prediction-band xC", tA * s * h0 / b, "xD", 2 * tA * s * h0 / b, "\n")
# Invented blank signals (same response units).
yb <- c(2.0, 2.3, 1.8, 2.1, 2.4, 1.9, 2.2, 2.0)
cat("blank signals LOD", (mean(yb) + 3 * sd(yb) - a) / b, "LOQ", (mean(yb) + 10 * sd(yb) - a) / b, "\n")
cat("response-sd blank LOD", 3.3 * sd(yb) / b, "\n")
# MDL sheet of the demo workbook (invented data), mg/kg.
sp <- c(0.505, 0.528, 0.493, 0.491, 0.504, 0.517, 0.512, 0.486)
mb <- c(0.022, 0.01, 0.01, 0.03, 0.017, 0.018, 0.021, -0.036, 0.033, 0.021)
mdls <- qt(0.99, length(sp) - 1) * sd(sp); mdlb <- max(mean(mb), 0) + qt(0.99, length(mb) - 1) * sd(mb)
cat("MDL_s", mdls, "MDL_b", mdlb, "MDL", max(mdls, mdlb), "\n")
# LowLevel sheet of the demo workbook (invented data), mg/kg.
lb <- c(0.007, 0.009, 0.01, -0.012, 0.016, 0.023, 0.028, -0.012, -0.01, -0.001,
        0.011, 0.003, 0.019, 0.053, 0.009, -0.021, 0.014, -0.008, 0.03, -0.012)
ll <- list(c(0.108, 0.083, 0.102, 0.104, 0.059, 0.087), c(0.093, 0.133, 0.106, 0.126, 0.097, 0.106),
           c(0.215, 0.2, 0.221, 0.151, 0.19, 0.179))
sw <- shapiro.test(lb); cat("Shapiro-Wilk W", sw$statistic, "p", sw$p.value, "\n")
lobP <- mean(lb) + 1.645 * sd(lb)
r <- 0.5 + 0.95 * length(lb); lbs <- sort(lb); lobN <- lbs[floor(r)] + (r - floor(r)) * (lbs[floor(r) + 1] - lbs[floor(r)])
L <- sum(lengths(ll)); J <- length(ll); sdl <- sqrt(sum(sapply(ll, function(v) (length(v) - 1) * var(v))) / (L - J))
cp <- 1.645 / (1 - 1 / (4 * (L - J)))
cat("LoB param", lobP, "LoB nonparam", lobN, "SD_L", sdl, "cp", cp, "LoD param", lobP + cp * sdl,
    "LoD nonparam", lobN + cp * sdl, "\n")
# SignalNoise sheet of the demo workbook (invented data): S1 at 0.10 mg/L.
H <- c(0.622, 0.625, 0.612); hn <- c(0.0212, 0.0199, 0.0192); sn <- mean(H) / mean(hn)
cat("S/N", sn, "LOD", 3 * 0.1 / sn, "LOQ", 10 * 0.1 / sn, "\n")
# Weighted (1/x) calibration, invented: x_C and x_D of one future measurement, weights normalised to mean 1.
xw <- c(0.1, 0.25, 0.5, 1, 2.5, 5, 10); yw <- c(4.55, 10.9, 21.6, 42.0, 105.9, 209.0, 423.5)
w <- (1 / xw) / mean(1 / xw); fw <- lm(yw ~ xw, weights = w); aw <- coef(fw)[[1]]; bw <- coef(fw)[[2]]
sw2 <- summary(fw)$sigma; xbw <- sum(w * xw) / sum(w); sxxw <- sum(w * (xw - xbw)^2)
wat <- function(x0) (1 / x0) / mean(1 / xw)
hh <- function(x0, w0) sqrt(1 / w0 + 1 / sum(w) + (x0 - xbw)^2 / sxxw)
tw <- qt(0.95, length(xw) - 2); w0 <- wat(min(xw)); rise <- tw * sw2 * hh(0, w0)
xD <- uniroot(function(x0) bw * x0 - tw * sw2 * hh(x0, wat(x0)) - rise, c(rise / bw, 10), tol = 1e-14)$root
cat("weighted a", aw, "b", bw, "s", sw2, "xC", rise / bw, "xD", xD, "\n")
cat("weighted response-sd LOD", 3.3 * sw2 / bw, "\n")
# EPA t table (40 CFR 136 App. B Rev. 2, from memory): t(n - 1, 0.99) for n = 7..30, rounded to 3 decimals.
cat("t", round(qt(0.99, 6:29), 3), "\n")
