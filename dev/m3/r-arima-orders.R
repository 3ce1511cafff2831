# The ARIMA order R's forecast package chooses for every M3 series with auto.arima's defaults, with
# whether a constant (mean or drift) is included, the AICc, log-likelihood and innovation variance,
# and the seasonal strength behind D (forecast:::seas.heuristic, nsdiffs' default test): the
# yardstick against which Annalist's AutoArima was compared order by order (issue 15, December 2026).
#
# dev/m3/r-arima-quarterly.csv and r-arima-yearly.csv were made so (R 4.2.2, forecast 8.20; monthly
# not run). Our side: src/test/java/.../forecast/ArimaOrdersDump.java writes our orders the same way.
#
# What the comparison found (December 2026). AutoArima.fit, which follows auto.arima's defaults,
# chose R's order for 755 of the 756 quarterly series and all 645 yearly ones, with the same d, D,
# constant and AICc (within 1e-4) on every agreeing series; the one exception (N1361: ours
# ARIMA(1,1,2) with drift, AICc 442.96, R's ARIMA(3,1,0) with drift, 442.28) is a stepwise path
# difference. Its forecasts score as R's: MASE quarterly 1.189 (R 1.189), yearly 2.957 (R 2.959).
# The outlook, however, used AutoArima.fitConditional: the stepwise search by conditional sum of
# squares with no exact refit, which R runs (with a refit) only for series longer than 150 values
# or periods above 12. It chose R's order for 329 of 756 quarterly series (d and D always the same;
# the constant differs for 92, the ARMA orders for 419: on short series the CSS criterion favours
# seasonal AR/MA terms, e.g. N0980, n = 44: (1,1,0)(2,0,1) with drift against R's (1,1,0)(1,0,0))
# and 524 of 645 yearly ones; ARIMA's own MASE 1.205 quarterly, 2.977 yearly, 0.889 monthly (R's
# 0.868). Outlook MASE (M3Benchmark --variant outlook, quarterly / yearly) by the search used:
#   conditional (before)                                 1.078 / 2.668
#   R's default (exact likelihood) for periods <= 4      1.083 / 2.662  (combination 1.082; 46 ms per series quarterly)
#   CSS search + exact refit (approximation = TRUE)      1.078 / -      (ARIMA alone 1.185; monthly 0.875 at 439 ms per series)
# Kept: R's default search for non-seasonal series only (AutoArima.fitForOutlook; the whole analysis,
# M3Benchmark without --variant, yearly: MASE 2.670 -> 2.664, sMAPE 16.19 -> 16.16, coverage 80 %
# 0.825 -> 0.824, 95 % 0.946 -> 0.946; quarterly and monthly take the same path as before); seasonal series
# keep the conditional search (better ARIMA alone, worse combination on quarterly; too slow monthly).
#
# Usage (from this folder): Rscript r-arima-orders.R /path/to/reference-data/forecasting quarterly out.csv [every]
# Reads m3-<freq>-train.csv only and writes the named output; nothing else is read or written.
# `every` = K takes every K-th series (monthly auto.arima takes seconds per series).
args <- commandArgs(trailingOnly = TRUE)
suppressMessages(library(forecast))
folder <- args[1]; freq <- args[2]; out <- args[3]
every <- if (length(args) > 3) as.integer(args[4]) else 1L
m <- c(yearly = 1, quarterly = 4, monthly = 12)[[freq]]
train <- read.csv(file.path(folder, paste0("m3-", freq, "-train.csv")), stringsAsFactors = FALSE)
ids <- unique(train$series)
ids <- ids[seq(1, length(ids), by = every)]
res <- list()
for (id in ids) {
  y <- ts(train$value[train$series == id], frequency = m)
  started <- proc.time()[["elapsed"]]
  f <- tryCatch(auto.arima(y), error = function(e) NULL)
  seconds <- proc.time()[["elapsed"]] - started
  if (is.null(f)) next
  a <- f$arma  # p, q, P, Q, m, d, D
  strength <- if (m > 1 && length(y) > 2 * m) {
    tryCatch(forecast:::seas.heuristic(y), error = function(e) NA)
  } else NA
  constant <- any(c("intercept", "drift") %in% names(f$coef))
  res[[length(res) + 1]] <- data.frame(series = id, n = length(y), p = a[1], d = a[6], q = a[2],
    P = a[3], D = a[7], Q = a[4], constant = as.integer(constant), aicc = f$aicc, loglik = f$loglik,
    sigma2 = f$sigma2, strength = strength, seconds = round(seconds, 3))
}
write.csv(do.call(rbind, res), out, row.names = FALSE, quote = FALSE)
