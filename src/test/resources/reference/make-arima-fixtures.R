# Reference values for the ARIMA tests (org.annalist.analysis.forecast.Arima*, AutoArima, UnitRootTests).
# Run from anywhere:  Rscript make-arima-fixtures.R   (R 4.2, forecast 8.20, urca, jsonlite)
# Writes into this folder: arima_series_*.csv (R datasets not already here), arima_fixed.json,
# arima_auto.csv, arima_unitroot.csv.
args <- commandArgs(trailingOnly = FALSE)
script <- sub("^--file=", "", args[grep("^--file=", args)])
if (length(script) == 1) setwd(dirname(normalizePath(script)))
suppressPackageStartupMessages({ library(forecast); library(jsonlite) })

period_label <- function(x) {
  f <- frequency(x); tt <- time(x)
  yr <- floor(tt + 1e-8); pos <- round((tt - yr) * f) + 1
  if (f == 12) sprintf("%d-%02d", yr, pos) else if (f == 4) sprintf("%d-Q%d", yr, pos) else sprintf("%d", yr)
}
write_series <- function(x, file) {
  write.csv(data.frame(period = period_label(x), value = as.numeric(x)), file, row.names = FALSE, quote = FALSE)
}
# R datasets that are not among the six CSVs of this folder
extra <- list(USAccDeaths = USAccDeaths, ldeaths = ldeaths, lynx = lynx, WWWusage = ts(WWWusage, frequency = 1),
              austres = austres, JohnsonJohnson = JohnsonJohnson)
for (nm in names(extra)) write_series(extra[[nm]], sprintf("arima_series_%s.csv", nm))

series <- list(AirPassengers = AirPassengers, UKgas = UKgas, co2 = co2, nottem = nottem, Nile = Nile,
               sunspot.year = sunspot.year, USAccDeaths = USAccDeaths, ldeaths = ldeaths, lynx = lynx,
               WWWusage = ts(WWWusage, frequency = 1), austres = austres, JohnsonJohnson = JohnsonJohnson,
               # a 40-value quarterly series for the timing: the last ten years of UKgas
               UKgas40 = window(UKgas, start = c(1977, 1)))

# (1) fixed orders: Arima(y, order, seasonal, include.mean / include.drift, method)
cases <- list(
  list("AirPassengers", c(0,1,1), c(0,1,1), FALSE, "ML"),
  list("AirPassengers", c(0,1,1), c(0,1,1), FALSE, "CSS"),
  list("AirPassengers", c(2,1,1), c(0,1,0), FALSE, "ML"),
  list("UKgas", c(1,1,1), c(0,1,1), FALSE, "ML"),
  list("UKgas", c(1,1,1), c(0,1,1), FALSE, "CSS"),
  list("Nile", c(1,0,1), c(0,0,0), TRUE, "ML"),
  list("Nile", c(1,0,1), c(0,0,0), TRUE, "CSS"),
  list("Nile", c(0,1,1), c(0,0,0), TRUE, "ML"),
  list("lynx", c(2,0,0), c(0,0,0), TRUE, "ML"),
  list("WWWusage", c(1,1,1), c(0,0,0), FALSE, "ML"),
  list("WWWusage", c(1,1,1), c(0,0,0), FALSE, "CSS"),
  list("USAccDeaths", c(0,1,1), c(0,1,1), FALSE, "ML"),
  list("nottem", c(1,0,0), c(2,0,0), TRUE, "ML"),
  list("co2", c(1,1,1), c(0,1,1), FALSE, "ML"),
  list("sunspot.year", c(2,0,1), c(0,0,0), TRUE, "ML"),
  list("ldeaths", c(1,0,1), c(1,1,0), FALSE, "CSS"),
  list("austres", c(0,2,2), c(0,0,0), FALSE, "ML"),
  list("USAccDeaths", c(1,0,0), c(0,1,1), TRUE, "ML"))
fixed <- lapply(cases, function(cs) {
  y <- series[[cs[[1]]]]; m <- frequency(y); d <- cs[[2]][2] + cs[[3]][2]
  fit <- Arima(y, order = cs[[2]], seasonal = list(order = cs[[3]], period = m),
               include.mean = cs[[4]] && d == 0, include.drift = cs[[4]] && d == 1, method = cs[[5]])
  h <- if (m > 1) 2 * m else 10
  fc <- forecast(fit, h = h, level = c(80, 95))
  list(name = sprintf("%s %s%s%s %s", cs[[1]], paste(cs[[2]], collapse = ","), paste(cs[[3]], collapse = ","),
                      if (cs[[4]]) "c" else "", cs[[5]]),
       series = cs[[1]], period = m, order = cs[[2]], seasonal = cs[[3]], constant = cs[[4]], method = cs[[5]],
       call = sprintf("Arima(%s, order = c(%s), seasonal = c(%s), include.mean/include.drift = %s, method = \"%s\"); forecast(fit, h = %d)",
                      cs[[1]], paste(cs[[2]], collapse = ","), paste(cs[[3]], collapse = ","), cs[[4]], cs[[5]], h),
       coef = unname(fit$coef), loglik = fit$loglik, sigma2 = fit$sigma2,
       aic = if (is.na(fit$aic)) NULL else fit$aic, aicc = if (is.na(fit$aicc)) NULL else fit$aicc,
       mean = as.numeric(fc$mean), lower80 = as.numeric(fc$lower[, 1]), upper80 = as.numeric(fc$upper[, 1]),
       lower95 = as.numeric(fc$lower[, 2]), upper95 = as.numeric(fc$upper[, 2]))
})
writeLines(toJSON(list(versions = list(R = R.version.string, forecast = as.character(packageVersion("forecast"))),
                       cases = fixed), auto_unbox = TRUE, digits = I(15), pretty = TRUE), "arima_fixed.json")

# (2) auto.arima with its defaults, and (3) the unit-root steps it takes
auto <- do.call(rbind, lapply(names(series), function(nm) {
  y <- series[[nm]]; m <- frequency(y)
  t0 <- proc.time()[["elapsed"]]
  fit <- auto.arima(y)
  secs <- proc.time()[["elapsed"]] - t0
  a <- fit$arma
  data.frame(series = nm, period = m, n = length(y), p = a[1], d = a[6], q = a[2], P = a[3], D = a[7], Q = a[4],
             constant = as.integer(any(names(fit$coef) %in% c("intercept", "drift"))),
             aicc = fit$aicc, loglik = fit$loglik, sigma2 = fit$sigma2,
             approximation = as.integer(length(y) > 150 | m > 12), seconds = secs)
}))
# the CSS-search path (R's approximation = TRUE) on three series where R's default searches by ML
approx <- do.call(rbind, lapply(c("AirPassengers", "USAccDeaths", "ldeaths", "UKgas", "lynx"), function(nm) {
  y <- series[[nm]]; m <- frequency(y)
  t0 <- proc.time()[["elapsed"]]
  fit <- auto.arima(y, approximation = TRUE)
  secs <- proc.time()[["elapsed"]] - t0
  a <- fit$arma
  data.frame(series = paste0(nm, "~approximation"), period = m, n = length(y), p = a[1], d = a[6], q = a[2],
             P = a[3], D = a[7], Q = a[4], constant = as.integer(any(names(fit$coef) %in% c("intercept", "drift"))),
             aicc = fit$aicc, loglik = fit$loglik, sigma2 = fit$sigma2, approximation = 1L, seconds = secs)
}))
write.csv(rbind(auto, approx), "arima_auto.csv", row.names = FALSE, quote = FALSE)

unit <- do.call(rbind, lapply(names(series), function(nm) {
  y <- series[[nm]]; m <- frequency(y); n <- length(y)
  k <- urca::ur.kpss(as.numeric(y), type = "mu", use.lag = trunc(3 * sqrt(n) / 13))
  D <- if (m > 1 && n > 2 * m) nsdiffs(y) else 0
  dx <- if (D > 0) diff(y, lag = m) else y
  data.frame(series = nm, period = m, kpss = k@teststat, kpss_lag = k@lag,
             seas_strength = if (m > 1 && n > 2 * m) forecast:::seas.heuristic(y) else NA,
             nsdiffs = D, ndiffs = ndiffs(dx))
}))
write.csv(unit, "arima_unitroot.csv", row.names = FALSE, quote = FALSE, na = "")
