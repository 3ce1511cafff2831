# The ETS model R's forecast package chooses for every M3 series, with its AICc, log-likelihood and
# smoothing parameters: the yardstick against which Annalist's ETS selection was compared model by
# model (issue 15, December 2026; dev/m3/r-ets-quarterly-models.csv was made so, R 4.2.2, forecast 8.20).
#
# What the comparison found on the 756 quarterly series (M3Benchmark and a dump of EtsSelection's
# choice, December 2026): the same model for 547; our AICc lower than R's (by > 0.1) for 333, higher
# for 199; R chose a damped trend 75 times, we 33 times. Our quasi-Newton search stalls on some fits:
# for 33 series the chosen model's smoothing parameters never left the start (alpha = 0.5), e.g.
# N0859 ETS(A,A,A) AICc 603.4 against R's 591.2, because the initial states' gradients are 10^2-10^4
# times those of the smoothing parameters. Tried and not kept (mean MASE of ETS alone, ours before ->
# after, quarterly / monthly / yearly; R's ets 1.170 / 0.865 / 2.860): smoothing parameters searched
# first with the states held, then all together: 1.210 -> 1.147 / 0.864 -> 0.870 / 2.761 -> 2.865
# (whole outlook quarterly 1.079 -> 1.067, monthly 0.829 -> 0.833); the same for seasonal models only:
# 1.189 / 0.867; alpha started at 0.2/m as R does: many more stalls (same model for 311 series only);
# keeping the lower criterion of both searches: 1.181 / - / 2.837; a restart only when stalled: 1.207;
# the trend state searched in units of scale/n: 1.216 / - / 2.779. The better likelihood optimum
# forecasts worse on monthly and yearly data, so none was kept.
#
# Kept (3 December 2026, late): R's own search for quarterly series (EtsSimplexSearch: the Nelder-Mead
# simplex over alpha, beta, gamma, phi and the states in their own units, R's start alpha =
# 1e-4 + 0.2(0.9999 - 1e-4)/m, beta and gamma a tenth and a twentieth of their ranges, phi 0.9782,
# the seasons from a decomposition of the whole series as forecast 8.20's initstate, points outside
# the usual or forecastable region refused, 2,000 evaluations): the same model as R for 745 of 756
# quarterly series (546 before; AICc within 0.1 of R's for most), ETS alone 1.210 -> 1.168, whole
# outlook 1.078 -> 1.060. On all frequencies: ETS alone monthly 0.849 -> 0.852 (every 3rd series),
# yearly 2.761 -> 2.857; whole outlook monthly 0.830 -> 0.832, yearly 2.663 -> 2.688; so monthly and
# yearly keep the quasi-Newton search. The simplex for seasonal models only: quarterly ETS 1.183,
# outlook 1.067, monthly outlook (every 3rd) 0.808 -> 0.812. The whole-series seasons with the
# quasi-Newton search alone: quarterly ETS 1.2096 -> 1.2091. Where our search and R's still differ
# most is model choice (210 series before, 79 after, mostly multiplicative against additive seasons).
#
# Usage (from this folder): Rscript r-ets-models.R /path/to/reference-data/forecasting quarterly out.csv
# Reads m3-<freq>-train.csv only and writes the named output; nothing else is read or written.
args <- commandArgs(trailingOnly = TRUE)
suppressMessages(library(forecast))
folder <- args[1]; freq <- args[2]; out <- args[3]
m <- c(yearly = 1, quarterly = 4, monthly = 12)[[freq]]
train <- read.csv(file.path(folder, paste0("m3-", freq, "-train.csv")), stringsAsFactors = FALSE)
res <- list()
for (id in unique(train$series)) {
  y <- ts(train$value[train$series == id], frequency = m)
  f <- tryCatch(ets(y), error = function(e) NULL)
  if (is.null(f)) next
  p <- f$par
  g <- function(n) if (n %in% names(p)) unname(p[[n]]) else NA
  res[[length(res) + 1]] <- data.frame(series = id, model = f$method, aicc = f$aicc, loglik = f$loglik,
    alpha = g("alpha"), beta = g("beta"), gamma = g("gamma"), phi = g("phi"), n = length(y))
}
tab <- do.call(rbind, res)
tab$model <- paste0("\"", tab$model, "\"")
write.csv(tab, out, row.names = FALSE, quote = FALSE)
