# Hold-out accuracy of R's automatic methods on eight public series, the yardstick of the outlook.
# Usage (from this folder; R 4.2.2, forecast 8.20): Rscript make-holdout8.R
# For each series the last two seasonal cycles are held out; ets(), auto.arima() and thetaf() with
# their defaults are fitted on the rest and forecast the held-out span. MASE: the mean absolute error
# scaled by the in-sample seasonal naive mean absolute error (Hyndman & Koehler 2006), for each
# method and for the mean of the three forecasts. Writes forecast_accuracy_holdout8.csv; reads only R's datasets.
suppressMessages(library(forecast))
series <- list(AirPassengers = list(AirPassengers, "AirPassengers.csv"), co2 = list(co2, "co2.csv"),
               UKgas = list(UKgas, "UKgas.csv"), nottem = list(nottem, "nottem.csv"),
               USAccDeaths = list(USAccDeaths, "arima_series_USAccDeaths.csv"),
               ldeaths = list(ldeaths, "arima_series_ldeaths.csv"),
               JohnsonJohnson = list(JohnsonJohnson, "arima_series_JohnsonJohnson.csv"),
               austres = list(austres, "arima_series_austres.csv"))
rows <- list()
for (name in names(series)) {
  y <- series[[name]][[1]]
  m <- frequency(y); h <- 2 * m; n <- length(y) - h
  train <- ts(y[1:n], start = start(y), frequency = m)
  test <- y[(n + 1):(n + h)]
  fe <- forecast(ets(train), h = h)
  fa <- forecast(auto.arima(train), h = h)
  ft <- thetaf(train, h = h)
  # by hand: accuracy() given a plain vector of outcomes scales by the non-seasonal naive error
  mase <- function(f) mean(abs(test - as.numeric(f$mean))) / mean(abs(diff(as.numeric(train), lag = m)))
  comb <- fe; comb$mean[] <- (as.numeric(fe$mean) + as.numeric(fa$mean) + as.numeric(ft$mean)) / 3
  rows[[name]] <- data.frame(dataset = name, file = series[[name]][[2]], frequency = m, n_train = n, h = h,
                             ets_MASE = mase(fe), arima_MASE = mase(fa), theta_MASE = mase(ft), mean3_MASE = mase(comb))
}
write.csv(do.call(rbind, rows), "forecast_accuracy_holdout8.csv", row.names = FALSE, quote = FALSE)
