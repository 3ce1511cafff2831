# R's automatic forecasts of the M3 competition series, as a yardstick for Annalist's outlook.
#
# Usage (from this folder, R >= 4.2 with the forecast package, Debian r-cran-forecast 8.20):
#   Rscript r-automatic-forecasts.R /path/to/reference-data/forecasting yearly|quarterly|monthly out.csv
# Reads m3-<freq>-train.csv and m3-<freq>-test.csv (the layout of make-m3.R) and writes, for every
# series, the point forecasts and the 80 % and 95 % limits of forecast::ets(), forecast::auto.arima()
# and forecast::thetaf() with their default settings, h = the number of held-out values, rounded to
# seven significant digits. dev/m3/r-{yearly,quarterly,monthly}.csv were made so on this project's
# machine (R 4.2.2, forecast 8.20, December 2026); the monthly run takes more than 80 minutes of CPU,
# so each series' rows are appended as soon as they are made and a rerun into the same output file
# skips the series it already holds (a run cut short resumes where it stopped). The monthly file is
# committed gzipped (r-monthly.csv.gz; M3Benchmark reads either): gunzip it before resuming into it.
# Nothing is read or written besides the two input files and the named output.
args <- commandArgs(trailingOnly = TRUE)
suppressMessages(library(forecast))
folder <- args[1]; freq <- args[2]; out <- args[3]
m <- c(yearly = 1, quarterly = 4, monthly = 12)[[freq]]
train <- read.csv(file.path(folder, paste0("m3-", freq, "-train.csv")), stringsAsFactors = FALSE)
test <- read.csv(file.path(folder, paste0("m3-", freq, "-test.csv")), stringsAsFactors = FALSE)
done <- if (file.exists(out)) unique(read.csv(out, stringsAsFactors = FALSE)$series) else character(0)
for (id in setdiff(unique(train$series), done)) {
  rows <- list()
  y <- ts(train$value[train$series == id], frequency = m)
  h <- sum(test$series == id)
  fits <- list(
    ETS = function() forecast(ets(y), h = h, level = c(80, 95)),
    ARIMA = function() forecast(auto.arima(y), h = h, level = c(80, 95)),
    THETA = function() thetaf(y, h = h, level = c(80, 95)))
  for (method in names(fits)) {
    f <- tryCatch(fits[[method]](), error = function(e) NULL)
    if (is.null(f)) next
    rows[[length(rows) + 1]] <- data.frame(method = method, series = id, h = seq_len(h),
      forecast = signif(as.numeric(f$mean), 7), lo80 = signif(as.numeric(f$lower[, 1]), 7),
      hi80 = signif(as.numeric(f$upper[, 1]), 7), lo95 = signif(as.numeric(f$lower[, 2]), 7),
      hi95 = signif(as.numeric(f$upper[, 2]), 7))
  }
  if (length(rows) > 0) write.table(do.call(rbind, rows), out, sep = ",", row.names = FALSE,
    quote = FALSE, append = file.exists(out), col.names = !file.exists(out))
}
cat("R", R.version$major, R.version$minor, "forecast", as.character(packageVersion("forecast")), "\n")
