#!/usr/bin/env Rscript
# make-fixtures.R -- writes the reference fixtures of this folder (src/test/resources/reference/).
#
# Run:  Rscript make-fixtures.R      (from anywhere; it changes into its own folder)
# Writes: the *.csv and *.json files of this folder, and no others (relative to this file).
#
# Copied from the shared script reference-data/make-reference.R
# (sha256 0a574e57b63d87c6a83fa4bfce5acb8b4e361850befde81bff4d15f3620fd966) with only these
# changes: every file is written into this folder instead of datasets/ and results/ (no
# subfolders); the outputs that are not fixtures here are left out (acf_diff_log_AirPassengers.csv,
# spec_pgram_co2.csv, acf_spec_calls.json, session.json); comments. The statistics, the calls and
# their order are unchanged. This copy has NOT been rerun (R was not installed where it was made):
# the fixtures are byte-for-byte the files that make-reference.R wrote with R 4.2.2 Patched
# (2022-11-10 r83330), forecast 8.20 and strucchange 1.5-3.
#
# Reference library: R (stats, datasets) plus the CRAN packages forecast and
# strucchange. Everything not available as a ready-made R function (Mann-Kendall S
# and Var(S), seasonal Kendall, Sen slopes and the Gilbert confidence interval) is
# computed below directly from the textbook formulas, written out in the comments.

suppressPackageStartupMessages({
  library(stats)
  library(datasets)
  library(forecast)
  library(strucchange)
})

## ---- work inside the folder this script sits in ---------------------------------
local({
  a <- commandArgs(trailingOnly = FALSE)
  f <- sub("^--file=", "", a[grep("^--file=", a)])
  if (length(f) == 1 && nzchar(f)) setwd(dirname(normalizePath(f)))
})

## ---- small helpers ----------------------------------------------------------------
# Period labels: monthly YYYY-MM, quarterly YYYY-Qn, annual YYYY.
period_labels <- function(x) {
  f <- frequency(x); st <- start(x); n <- length(x)
  k <- (st[1] * f + st[2] - 1) + 0:(n - 1)
  yr <- k %/% f; per <- k %% f + 1
  if (f == 12) sprintf("%04d-%02d", yr, per)
  else if (f == 4) sprintf("%04d-Q%d", yr, per)
  else if (f == 1) sprintf("%04d", yr)
  else stop("unsupported frequency")
}

# Numbers are written with up to 15 significant digits (R's default for CSV output).
write_csv <- function(df, file) {
  write.csv(df, file, row.names = FALSE, quote = FALSE, na = "", fileEncoding = "UTF-8")
}

# Minimal JSON writer (base R only). Named lists -> objects, unnamed lists -> arrays,
# atomic vectors of length 1 -> scalars unless wrapped in I(), longer ones -> arrays,
# NA/NaN/Inf -> null.
json_str <- function(s) {
  s <- gsub("\\", "\\\\", s, fixed = TRUE)
  s <- gsub("\"", "\\\"", s, fixed = TRUE)
  s <- gsub("\n", "\\n", s, fixed = TRUE)
  s <- gsub("\t", "\\t", s, fixed = TRUE)
  paste0("\"", s, "\"")
}
json_atom <- function(x) {
  if (is.factor(x)) x <- as.character(x)
  if (is.logical(x)) return(ifelse(is.na(x), "null", ifelse(x, "true", "false")))
  if (is.numeric(x)) {
    x <- as.double(x)
    return(ifelse(!is.finite(x), "null", sprintf("%.15g", x)))
  }
  ifelse(is.na(x), "null", json_str(as.character(x)))
}
to_json <- function(x, indent = 0) {
  pad <- strrep("  ", indent); pad1 <- strrep("  ", indent + 1)
  if (is.null(x)) return("null")
  if (is.list(x)) {
    nm <- names(x)
    if (length(x) == 0) return(if (is.null(nm)) "[]" else "{}")
    items <- vapply(x, to_json, "", indent = indent + 1)
    if (!is.null(nm) && all(nzchar(nm)))
      return(paste0("{\n", paste0(pad1, json_str(nm), ": ", items, collapse = ",\n"), "\n", pad, "}"))
    return(paste0("[\n", paste0(pad1, items, collapse = ",\n"), "\n", pad, "]"))
  }
  v <- json_atom(unname(x))
  if (length(x) == 1 && !inherits(x, "AsIs")) return(v)
  paste0("[", paste(v, collapse = ", "), "]")
}
write_json <- function(x, file) writeLines(to_json(x), file, useBytes = TRUE)
nlist <- function(v) as.list(v)   # named vector -> JSON object

versions <- list(
  R = R.version.string,
  stats = as.character(packageVersion("stats")),
  forecast = as.character(packageVersion("forecast")),
  strucchange = as.character(packageVersion("strucchange"))
)

## ---- 0. datasets --------------------------------------------------------------------
series <- list(AirPassengers = AirPassengers, co2 = co2, Nile = Nile,
               UKgas = UKgas, nottem = nottem, sunspot.year = sunspot.year)
for (nm in names(series)) {
  x <- series[[nm]]
  write_csv(data.frame(period = period_labels(x), value = as.numeric(x)),
            paste0(nm, ".csv"))
}

## ---- a) STL -----------------------------------------------------------------------
stl_fits <- list(
  AirPassengers_log = list(x = log(AirPassengers), transform = "natural log",
      call = 'stl(log(AirPassengers), s.window = "periodic", robust = TRUE)',
      fit = stl(log(AirPassengers), s.window = "periodic", robust = TRUE), robust = TRUE,
      periodic = TRUE),
  co2 = list(x = co2, transform = "none",
      call = "stl(co2, s.window = 7, robust = FALSE)",
      fit = stl(co2, s.window = 7, robust = FALSE), robust = FALSE, periodic = FALSE),
  nottem = list(x = nottem, transform = "none",
      call = "stl(nottem, s.window = 13, robust = TRUE)",
      fit = stl(nottem, s.window = 13, robust = TRUE), robust = TRUE, periodic = FALSE)
)
stl_params <- list()
for (nm in names(stl_fits)) {
  s <- stl_fits[[nm]]; fit <- s$fit; ts_ <- fit$time.series
  df <- data.frame(index = seq_along(s$x), period = period_labels(s$x),
                   input = as.numeric(s$x),
                   seasonal = as.numeric(ts_[, "seasonal"]),
                   trend = as.numeric(ts_[, "trend"]),
                   remainder = as.numeric(ts_[, "remainder"]))
  if (s$robust) df$robustness_weight <- fit$weights
  write_csv(df, paste0("stl_", nm, ".csv"))
  stl_params[[nm]] <- list(
    call = s$call, input_transform = s$transform, n = length(s$x),
    n.p = frequency(s$x),
    s.window_requested = if (s$periodic) "periodic" else unname(fit$win["s"]),
    s.window = unname(fit$win["s"]), s.degree = unname(fit$deg["s"]),
    t.window = unname(fit$win["t"]), t.degree = unname(fit$deg["t"]),
    l.window = unname(fit$win["l"]), l.degree = unname(fit$deg["l"]),
    inner = fit$inner, outer = fit$outer,
    s.jump = unname(fit$jump["s"]), t.jump = unname(fit$jump["t"]),
    l.jump = unname(fit$jump["l"]),
    robust = s$robust, periodic = s$periodic,
    weights_written = s$robust,
    file = paste0("stl_", nm, ".csv"))
}
stl_params$note <- paste(
  "Values read back from the fitted stl objects ($win, $deg, $jump, $inner, $outer).",
  "For s.window='periodic' R sets s.window = 10*n+1 and s.degree = 0, and after the",
  "fit replaces the seasonal component by its mean for each cycle position",
  "(remainder = input - seasonal - trend). Default t.window =",
  "nextodd(ceiling(1.5*n.p/(1-1.5/s.window))), l.window = nextodd(n.p),",
  "jumps = ceiling(window/10); robust=TRUE means inner=1, outer=15, otherwise inner=2, outer=0.")
stl_params$versions <- versions
write_json(stl_params, "stl_params.json")

## ---- b) Mann-Kendall / Kendall trend test --------------------------------------------
# S = sum_{i<j} sign(x_j - x_i)
# Var(S) = [ n(n-1)(2n+5) - sum_g t_g(t_g-1)(2t_g+5) ] / 18, t_g = size of tie group g
#   (textbook Mann-Kendall variance with ties correction; time index has no ties)
# Z (no continuity correction) = S / sqrt(Var(S))
# Z (continuity correction)    = (S - sign(S)) / sqrt(Var(S))
# Two-sided p = 2 * (1 - Phi(|Z|)).
mk_S <- function(x) {
  n <- length(x); s <- 0
  for (i in 1:(n - 1)) s <- s + sum(sign(x[(i + 1):n] - x[i]))
  s
}
mk_var <- function(x) {
  n <- length(x); t <- table(x); t <- t[t > 1]
  (n * (n - 1) * (2 * n + 5) - sum(t * (t - 1) * (2 * t + 5))) / 18
}
mk_rows <- list()
for (nm in names(series)) {
  x <- as.numeric(series[[nm]]); n <- length(x); tt <- seq_along(x)
  ct0 <- cor.test(x, tt, method = "kendall", exact = FALSE, continuity = FALSE)
  ct1 <- cor.test(x, tt, method = "kendall", exact = FALSE, continuity = TRUE)
  S <- mk_S(x); V <- mk_var(x); V0 <- n * (n - 1) * (2 * n + 5) / 18
  tg <- table(x); tg <- tg[tg > 1]
  z0 <- S / sqrt(V); z1 <- (S - sign(S)) / sqrt(V)
  mk_rows[[nm]] <- data.frame(
    dataset = nm, n = n, tie_groups = length(tg), tied_values = sum(tg),
    S = S, var_S_no_ties = V0, var_S_ties = V,
    tau_a = S / (n * (n - 1) / 2),
    cortest_tau_b = unname(ct0$estimate),
    cortest_z_nocc = unname(ct0$statistic), cortest_p_nocc = ct0$p.value,
    cortest_z_cc = unname(ct1$statistic), cortest_p_cc = ct1$p.value,
    formula_z_nocc = z0, formula_p_nocc = 2 * pnorm(-abs(z0)),
    formula_z_cc = z1, formula_p_cc = 2 * pnorm(-abs(z1)))
}
mk <- do.call(rbind, mk_rows)
write_csv(mk, "mann_kendall.csv")

## ---- c) Seasonal Kendall (Hirsch, Slack & Smith 1982) -------------------------------
# For each season g (month or quarter), with the values of that season in year order:
#   S_g = sum_{i<j} sign(x_gj - x_gi)
#   Var(S_g) = [ n_g(n_g-1)(2n_g+5) - sum_t t(t-1)(2t+5) ] / 18  (ties within season g)
# S' = sum_g S_g ; Var(S') = sum_g Var(S_g)   (seasons treated as independent; no
#   covariance correction for serial dependence)
# Z = (S' - 1)/sqrt(Var(S')) if S' > 0 ; 0 if S' = 0 ; (S' + 1)/sqrt(Var(S')) if S' < 0
#   (continuity-corrected form, as in Hirsch et al. 1982); also given without correction.
# Two-sided p = 2 * (1 - Phi(|Z|)).
# Seasonal Sen slope (Hirsch et al. 1982): median over all seasons of all within-season
#   pairwise slopes (x_gj - x_gi)/(year_j - year_i), j > i; units per year.
sk_rows <- list(); sk_sum <- list()
seasonal_sets <- c("AirPassengers", "co2", "UKgas", "nottem")
for (nm in seasonal_sets) {
  xs <- series[[nm]]; f <- frequency(xs)
  cyc <- as.integer(cycle(xs)); yr <- floor(as.numeric(time(xs)) + 1e-8)
  all_slopes <- c()
  for (g in 1:f) {
    xg <- as.numeric(xs)[cyc == g]; yg <- yr[cyc == g]; ng <- length(xg)
    Sg <- mk_S(xg); Vg <- mk_var(xg)
    sl <- c()
    for (i in 1:(ng - 1)) sl <- c(sl, (xg[(i + 1):ng] - xg[i]) / (yg[(i + 1):ng] - yg[i]))
    all_slopes <- c(all_slopes, sl)
    tg <- table(xg); tg <- tg[tg > 1]
    sk_rows[[paste(nm, g)]] <- data.frame(dataset = nm, season = g,
      season_label = if (f == 12) month.abb[g] else paste0("Q", g),
      n_years = ng, tie_groups = length(tg), S = Sg, var_S = Vg,
      sen_slope_per_year = median(sl))
  }
  rows <- do.call(rbind, sk_rows[grep(paste0("^", nm, " "), names(sk_rows))])
  Ssum <- sum(rows$S); Vsum <- sum(rows$var_S)
  zcc <- if (Ssum > 0) (Ssum - 1) / sqrt(Vsum) else if (Ssum < 0) (Ssum + 1) / sqrt(Vsum) else 0
  znc <- Ssum / sqrt(Vsum)
  sk_sum[[nm]] <- data.frame(dataset = nm, seasons = f, n = length(xs), S = Ssum,
    var_S = Vsum, Z_cc = zcc, p_two_sided_cc = 2 * pnorm(-abs(zcc)),
    Z_nocc = znc, p_two_sided_nocc = 2 * pnorm(-abs(znc)),
    n_within_season_slopes = length(all_slopes),
    seasonal_sen_slope_per_year = median(all_slopes))
}
write_csv(do.call(rbind, sk_rows), "seasonal_kendall_by_season.csv")
write_csv(do.call(rbind, sk_sum), "seasonal_kendall_summary.csv")

## ---- d) Sen slope with Gilbert (1987) confidence interval ---------------------------
# Slopes Q_k = (x_j - x_i)/(j - i) for all i < j (j, i = observation index, so units are
# "per observation step"; per year = per step * frequency). N' = n(n-1)/2.
# Sen slope = median(Q).  Gilbert (1987) rank method, 95%:
#   C = z_{0.975} * sqrt(Var(S)), Var(S) as in b) (ties-corrected), z_{0.975} = qnorm(0.975)
#   M1 = (N' - C)/2,  M2 = (N' + C)/2
#   Lower limit = the M1-th, upper limit = the (M2+1)-th of the ascending ordered Q.
# Non-integer ranks are resolved by LINEAR INTERPOLATION between the two neighbouring
# order statistics: value at rank r = Q[floor(r)] + (r - floor(r)) * (Q[floor(r)+1] - Q[floor(r)])
# (1-based ranks). Columns *_gilbert use ranks M1 and M2+1; columns *_alt_M2 use ranks
# M1 and M2 (a variant found in several implementations). No rounding is applied.
rank_value <- function(q, r) {
  lo <- floor(r); hi <- min(lo + 1, length(q)); w <- r - lo
  if (lo < 1) return(q[1])
  q[lo] + w * (q[hi] - q[lo])
}
sen_rows <- list()
for (nm in names(series)) {
  x <- as.numeric(series[[nm]]); n <- length(x); f <- frequency(series[[nm]])
  q <- c()
  for (i in 1:(n - 1)) q <- c(q, (x[(i + 1):n] - x[i]) / ((i + 1):n - i))
  q <- sort(q); Np <- length(q)
  V <- mk_var(x); C <- qnorm(0.975) * sqrt(V)
  M1 <- (Np - C) / 2; M2 <- (Np + C) / 2
  seas <- if (nm %in% names(sk_sum)) sk_sum[[nm]]$seasonal_sen_slope_per_year else NA
  sen_rows[[nm]] <- data.frame(dataset = nm, frequency = f, n = n, N_pairs = Np,
    sen_slope_per_step = median(q), sen_slope_per_year = median(q) * f,
    var_S = V, z975 = qnorm(0.975), C = C, M1 = M1, M2 = M2,
    lower_gilbert = rank_value(q, M1), upper_gilbert = rank_value(q, M2 + 1),
    upper_alt_M2 = rank_value(q, M2),
    seasonal_sen_slope_per_year = seas)
}
write_csv(do.call(rbind, sen_rows), "sen_slope.csv")

## ---- e) Structural breaks (strucchange) ---------------------------------------------
bp <- breakpoints(Nile ~ 1)                  # h = 0.15 (default)
sbp <- summary(bp)
bp_opt <- breakpoints(bp)                     # number of breaks chosen by BIC
ci <- confint(bp)                             # 95% (level = 0.95 default)
cim <- ci$confint
seg <- coef(bp, breaks = length(bp_opt$breakpoints))   # segment means
fs <- Fstats(Nile ~ 1)                        # from = 0.15 (default)
st <- sctest(fs)                              # supF test
rss_tab <- data.frame(m = as.integer(colnames(sbp$RSS)),
                      RSS = as.numeric(sbp$RSS["RSS", ]),
                      BIC = as.numeric(sbp$RSS["BIC", ]))
write_csv(rss_tab, "nile_breakpoints_rss_bic.csv")
bp_by_m <- lapply(1:5, function(m) {
  b <- breakpoints(bp, breaks = m)$breakpoints
  list(m = m, break_index = I(b), break_year = I(as.integer(time(Nile))[b]))
})
nile_years <- as.integer(time(Nile))
fst <- data.frame(break_index = which(nile_years %in% as.integer(time(fs$Fstats))),
                  break_year = as.integer(time(fs$Fstats)), F = as.numeric(fs$Fstats))
write_csv(fst, "nile_fstats.csv")
write_json(list(
  call = "breakpoints(Nile ~ 1)  [h = 0.15]; breakpoints(bp); confint(bp); Fstats(Nile ~ 1); sctest(fs)",
  n = length(Nile), h_fraction = 0.15,
  min_segment_length = floor(0.15 * length(Nile)),
  min_segment_length_note = "not stored in the object; strucchange uses h <- floor(n * h) for h < 1",
  chosen_number_of_breaks_BIC = length(bp_opt$breakpoints),
  break_index = I(bp_opt$breakpoints),
  break_date = I(breakdates(bp_opt)),
  break_meaning = "the break index is the LAST observation of the first segment",
  confint_95 = list(lower_index = unname(cim[, 1]), index = unname(cim[, 2]),
                    upper_index = unname(cim[, 3]),
                    lower_date = unname(breakdates(ci)[, 1]),
                    date = unname(breakdates(ci)[, 2]),
                    upper_date = unname(breakdates(ci)[, 3])),
  segments = lapply(seq_len(nrow(seg)), function(i) {
    b <- c(0, bp_opt$breakpoints, length(Nile))
    list(label = rownames(seg)[i], first_index = b[i] + 1, last_index = b[i + 1],
         first_year = nile_years[b[i] + 1], last_year = nile_years[b[i + 1]],
         mean = unname(seg[i, 1]))
  }),
  RSS_BIC_by_m = lapply(seq_len(nrow(rss_tab)), function(i) as.list(rss_tab[i, ])),
  breaks_by_m = bp_by_m,
  supF = list(statistic = unname(st$statistic), p_value = st$p.value,
              argmax_index = fs$breakpoint, argmax_year = nile_years[fs$breakpoint],
              trimming_from = 0.15,
              candidate_years = I(range(as.integer(time(fs$Fstats)))),
              p_value_note = "sctest reports the p-value floored at machine epsilon (2.22e-16)"),
  versions = versions
), "nile_breakpoints.json")

## ---- f) Holt-Winters (stats::HoltWinters) --------------------------------------------
hw_out <- list()
hw_specs <- list(
  co2 = list(call = "HoltWinters(co2)", fit = HoltWinters(co2), x = co2),
  AirPassengers_mult = list(call = 'HoltWinters(AirPassengers, seasonal = "multiplicative")',
      fit = HoltWinters(AirPassengers, seasonal = "multiplicative"), x = AirPassengers))
for (nm in names(hw_specs)) {
  h <- hw_specs[[nm]]; fit <- h$fit
  p <- predict(fit, n.ahead = 24, prediction.interval = TRUE, level = 0.95)
  fut <- ts(rep(0, 24), start = tsp(h$x)[2] + 1 / frequency(h$x), frequency = frequency(h$x))
  write_csv(data.frame(step = 1:24, period = period_labels(fut),
                       fit = as.numeric(p[, "fit"]), lwr95 = as.numeric(p[, "lwr"]),
                       upr95 = as.numeric(p[, "upr"])),
            paste0("holtwinters_", nm, "_forecast.csv"))
  hw_out[[nm]] <- list(call = h$call, seasonal = fit$seasonal,
    alpha = unname(fit$alpha), beta = unname(fit$beta), gamma = unname(fit$gamma),
    SSE = fit$SSE, coefficients = nlist(fit$coefficients),
    forecast_file = paste0("holtwinters_", nm, "_forecast.csv"))
}
hw_out$note <- paste(
  "Defaults: start.periods = 2; initial level/trend/seasonals from decompose() of the",
  "first 2 seasons; alpha, beta, gamma minimise SSE of one-step errors via optim",
  "(L-BFGS-B, start 0.3/0.1/0.1). Forecast: additive (a + h*b) + s_h, multiplicative",
  "(a + h*b) * s_h, with s_h = coefficient s((h-1) mod 12 + 1). Prediction intervals:",
  "predict(..., prediction.interval = TRUE, level = 0.95), using R's internal variance",
  "formula in stats:::predict.HoltWinters (fit +/- qnorm(0.975)*sqrt(var(residuals)*sum psi^2)).")
hw_out$versions <- versions
write_json(hw_out, "holtwinters.json")

## ---- g) ETS (forecast::ets) ---------------------------------------------------------
ets_specs <- list(
  AirPassengers_auto = list(call = "ets(AirPassengers)", x = AirPassengers,
                            fit = ets(AirPassengers)),
  UKgas_auto = list(call = "ets(UKgas)", x = UKgas, fit = ets(UKgas)),
  AirPassengers_MAM = list(call = 'ets(AirPassengers, model = "MAM", damped = FALSE)',
                           x = AirPassengers,
                           fit = ets(AirPassengers, model = "MAM", damped = FALSE)))
ets_out <- list()
for (nm in names(ets_specs)) {
  e <- ets_specs[[nm]]; fit <- e$fit
  set.seed(20240101)   # not needed for these models (intervals are analytic) but harmless
  fc <- forecast(fit, h = 24, level = c(80, 95))
  write_csv(data.frame(step = 1:24, period = period_labels(fc$mean),
                       mean = as.numeric(fc$mean),
                       lo80 = as.numeric(fc$lower[, 1]), hi80 = as.numeric(fc$upper[, 1]),
                       lo95 = as.numeric(fc$lower[, 2]), hi95 = as.numeric(fc$upper[, 2])),
            paste0("ets_", nm, "_forecast.csv"))
  ets_out[[nm]] <- list(call = e$call, model = fit$method,
    components = list(error = fit$components[1], trend = fit$components[2],
                      season = fit$components[3], damped = as.logical(fit$components[4])),
    parameters = nlist(fit$par), initial_states = nlist(fit$initstate),
    AIC = fit$aic, AICc = fit$aicc, BIC = fit$bic, sigma2 = fit$sigma2,
    loglik = fit$loglik, mse = fit$mse, n = length(e$x),
    forecast_call = "forecast(fit, h = 24, level = c(80, 95))",
    forecast_file = paste0("ets_", nm, "_forecast.csv"))
}
ets_out$note <- paste(
  "parameters = fit$par (smoothing parameters, phi if damped, and the estimated initial",
  "states l, b, s0..s(m-2) as the package names them; the last seasonal initial state is",
  "not free). initial_states = fit$initstate (all m seasonal initial states, which the",
  "package names s1..sm; par's s0 is initstate's s1, and so on). AIC/AICc/BIC/sigma2 as stored by",
  "forecast::ets. Default ets() settings: opt.crit = 'lik', ic = 'aicc', bounds = 'both'.")
ets_out$versions <- versions
write_json(ets_out, "ets.json")

## ---- h) ACF and periodogram ---------------------------------------------------------
a1 <- acf(AirPassengers, lag.max = 48, plot = FALSE)
write_csv(data.frame(lag = 0:48, lag_years = as.numeric(a1$lag), acf = as.numeric(a1$acf)),
          "acf_AirPassengers.csv")
# fast = FALSE: no padding, Fourier frequencies k*12/468 cycles/year, k = 1..234. (spec.pgram's
# default fast = TRUE zero-pads the detrended series from 468 to nextn(468) = 480 before the FFT;
# notes as make-reference.R writes them into its acf_spec_calls.json, which is not a fixture here.)
sp2 <- spec.pgram(co2, taper = 0, detrend = TRUE, fast = FALSE, plot = FALSE)
write_csv(data.frame(k = seq_along(sp2$freq), freq_cycles_per_year = sp2$freq,
                     period_months = 12 / sp2$freq, spec = sp2$spec),
          "spec_pgram_co2_nopad.csv")

## ---- i) Classical decomposition -----------------------------------------------------
dc <- decompose(AirPassengers, type = "multiplicative")
write_csv(data.frame(month = 1:12, month_abb = month.abb, seasonal_figure = dc$figure),
          "decompose_AirPassengers_figure.csv")
write_csv(data.frame(index = seq_along(AirPassengers), period = period_labels(AirPassengers),
                     x = as.numeric(AirPassengers), trend = as.numeric(dc$trend),
                     seasonal = as.numeric(dc$seasonal), random = as.numeric(dc$random)),
          "decompose_AirPassengers.csv")

## ---- j) tsoutliers on a modified copy of AirPassengers ------------------------------
xo <- AirPassengers
orig40 <- xo[40]; orig100 <- xo[100]
xo[40] <- xo[40] * 1.6
xo[100] <- xo[100] * 0.6
to <- tsoutliers(xo)
to_orig <- tsoutliers(AirPassengers)
to_log <- tsoutliers(log(xo))
lab <- period_labels(AirPassengers)
write_csv(data.frame(index = seq_along(xo), period = lab, original = as.numeric(AirPassengers),
                     modified = as.numeric(xo)),
          "tsoutliers_AirPassengers_modified_series.csv")
write_json(list(
  modification = list(
    list(index = 40, period = lab[40], original = orig40, factor = 1.6, modified = xo[40]),
    list(index = 100, period = lab[100], original = orig100, factor = 0.6, modified = xo[100])),
  call = "tsoutliers(x)  # x = AirPassengers with x[40] <- x[40]*1.6; x[100] <- x[100]*0.6",
  result = list(index = I(to$index), period = I(lab[to$index]),
                replacements = I(as.numeric(to$replacements))),
  supplementary_unmodified = list(call = "tsoutliers(AirPassengers)",
                index = I(to_orig$index), period = I(lab[to_orig$index]),
                replacements = I(as.numeric(to_orig$replacements))),
  supplementary_log_modified = list(call = "tsoutliers(log(x))",
                index = I(to_log$index), period = I(lab[to_log$index]),
                replacements_log = I(as.numeric(to_log$replacements)),
                replacements_exp = I(exp(as.numeric(to_log$replacements)))),
  versions = versions
), "tsoutliers_AirPassengers.json")


## ---- k) cycle length of sunspot.year -------------------------------------------------
# Dominant period (years) of the AR spectrum (spec.ar, order by AIC) and of the raw
# periodogram (spec.pgram, taper = 0, detrend = TRUE, fast = FALSE), frequency in cycles/year.
sa <- spec.ar(sunspot.year, plot = FALSE)
sp <- spec.pgram(sunspot.year, taper = 0, detrend = TRUE, fast = FALSE, plot = FALSE)
write_json(list(
  dataset = "sunspot.year",
  spec_ar = list(call = "spec.ar(sunspot.year, plot = FALSE)", order = sa$method,
                 peak_frequency = sa$freq[which.max(sa$spec)],
                 peak_period_years = 1 / sa$freq[which.max(sa$spec)]),
  spec_pgram = list(call = "spec.pgram(sunspot.year, taper = 0, detrend = TRUE, fast = FALSE, plot = FALSE)",
                 peak_frequency = sp$freq[which.max(sp$spec)],
                 peak_period_years = 1 / sp$freq[which.max(sp$spec)]),
  versions = versions
), "cycle_sunspot_year.json")

## ---- l) forecast accuracy with the last two seasons held out --------------------------
# For each seasonal dataset: train = all but the last 2*frequency observations,
# test = the last 2*frequency. Fit ets() (automatic, forecast package) and snaive();
# forecast h = 2*frequency; MASE from forecast::accuracy (scaled by the in-sample
# seasonal-naive MAE); sMAPE computed by hand as mean(200*|y - f| / (|y| + |f|)).
acc_rows <- list()
for (nm in c("AirPassengers", "co2", "UKgas", "nottem")) {
  x <- series[[nm]]; f <- frequency(x); h <- 2 * f; n <- length(x)
  train <- window(x, end = time(x)[n - h]); test <- window(x, start = time(x)[n - h + 1])
  fe <- forecast(ets(train), h = h); fs <- snaive(train, h = h)
  ae <- accuracy(fe, test); as <- accuracy(fs, test)
  smape <- function(fc) mean(200 * abs(as.numeric(test) - as.numeric(fc$mean)) /
                               (abs(as.numeric(test)) + abs(as.numeric(fc$mean))))
  acc_rows[[nm]] <- data.frame(dataset = nm, frequency = f, n_train = n - h, h = h,
    test_start = period_labels(x)[n - h + 1], ets_model = fe$method,
    ets_MASE = ae["Test set", "MASE"], ets_sMAPE = smape(fe),
    snaive_MASE = as["Test set", "MASE"], snaive_sMAPE = smape(fs))
}
write_csv(do.call(rbind, acc_rows), "forecast_accuracy_holdout.csv")

cat("done\n")
