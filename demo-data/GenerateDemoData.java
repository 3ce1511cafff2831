/*
 * Writes the invented demo data of Annalist into this folder. Seeded, so every run writes the same
 * files:
 *
 *     java demo-data/GenerateDemoData.java demo-data
 *
 * The scenario is made up: the lake-and-fell region of Quennelmark, its home market, the
 * neighbouring country of Brevania and long-haul visitors, and a glassworks museum. See README.md
 * for what each file holds.
 */
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.YearMonth;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

public class GenerateDemoData {

    static final YearMonth FIRST = YearMonth.of(2011, 1);
    static final YearMonth LAST = YearMonth.of(2026, 10);
    /** The Quennel rail tunnel to Brevania opens: a lasting step up for that market. */
    static final YearMonth TUNNEL_OPENS = YearMonth.of(2016, 5);
    /** The Tall Ships Regatta on Lake Quennel: a one-off month. */
    static final YearMonth REGATTA = YearMonth.of(2019, 7);
    /** Storm damage closes the Skarr bridge, the region's main road in; traffic recovers over 18 months. */
    static final YearMonth BRIDGE_CLOSES = YearMonth.of(2021, 1);
    static final int RECOVERY_MONTHS = 18;
    /** Share of the old level regained once the recovery is over. */
    static final double RECOVERED_SHARE = 0.9;
    /** A month the long-haul survey was not run. */
    static final YearMonth SURVEY_GAP = YearMonth.of(2017, 3);

    record Market(String name, double baseNights, double growthPerYear, double easterBoost, double meanStay,
                  double[] season) {
    }

    // Seasonal factors Jan..Dec: a strong summer peak, a smaller winter (ski) peak in February.
    static final double[] HOME_SEASON = {0.80, 0.92, 0.70, 0.78, 0.90, 1.12, 1.55, 1.62, 1.05, 0.82, 0.62, 0.92};
    static final double[] BREVANIA_SEASON = {0.95, 1.15, 0.72, 0.80, 0.92, 1.05, 1.45, 1.50, 0.98, 0.80, 0.58, 1.10};
    static final double[] LONG_HAUL_SEASON = {0.55, 0.60, 0.70, 0.85, 1.05, 1.30, 1.50, 1.45, 1.25, 0.95, 0.55, 0.75};

    static final List<Market> MARKETS = List.of(
            new Market("Domestic", 61_000, 0.015, 0.14, 2.4, HOME_SEASON),
            new Market("Brevania", 23_000, 0.030, 0.09, 3.1, BREVANIA_SEASON),
            new Market("Long-haul", 9_500, 0.050, 0.03, 5.2, LONG_HAUL_SEASON));

    public static void main(String[] args) throws IOException {
        Path folder = Path.of(args.length > 0 ? args[0] : "demo-data");
        Random random = new Random(20261101L);
        int months = (int) (FIRST.until(LAST, java.time.temporal.ChronoUnit.MONTHS) + 1);
        long[][] nights = new long[MARKETS.size()][months];
        long[][] arrivals = new long[MARKETS.size()][months];
        for (int m = 0; m < MARKETS.size(); m++) {
            Market market = MARKETS.get(m);
            for (int t = 0; t < months; t++) {
                YearMonth month = FIRST.plusMonths(t);
                double years = t / 12.0;
                double level = market.baseNights() * Math.pow(1 + market.growthPerYear(), years);
                if (market.name().equals("Brevania") && !month.isBefore(TUNNEL_OPENS)) {
                    level *= 1.30;
                }
                level *= disruption(month);
                double value = level * market.season()[month.getMonthValue() - 1]
                        * (1 + market.easterBoost() * easterShare(month))
                        * (month.equals(REGATTA) ? 1.22 : 1.0)
                        * Math.exp(0.035 * random.nextGaussian());
                nights[m][t] = Math.round(value);
                double stay = market.meanStay() * (1 + 0.04 * random.nextGaussian());
                arrivals[m][t] = Math.round(value / stay);
            }
        }
        writeNights(folder.resolve("quennelmark-guest-nights.csv"), nights, months);
        writeArrivals(folder.resolve("quennelmark-arrivals.csv"), arrivals, months);
        writeMuseum(folder.resolve("glassworks-daily-visitors.csv"), new Random(20230101L));
    }

    /** Level multiplier of the bridge closure: a collapse, then a linear recovery to 90 % of before. */
    static double disruption(YearMonth month) {
        if (month.isBefore(BRIDGE_CLOSES)) {
            return 1.0;
        }
        long since = BRIDGE_CLOSES.until(month, java.time.temporal.ChronoUnit.MONTHS);
        if (since < 3) {
            return 0.35;
        }
        if (since < 3 + RECOVERY_MONTHS) {
            return 0.35 + (RECOVERED_SHARE - 0.35) * (since - 2) / (double) RECOVERY_MONTHS;
        }
        return RECOVERED_SHARE;
    }

    /** Share of the ten days before Easter Sunday that fall in this month. */
    static double easterShare(YearMonth month) {
        LocalDate easter = easterSunday(month.getYear());
        int inMonth = 0;
        for (int d = 1; d <= 10; d++) {
            if (YearMonth.from(easter.minusDays(d)).equals(month)) {
                inMonth++;
            }
        }
        return inMonth / 10.0;
    }

    /** Gregorian Easter Sunday, the "anonymous Gregorian" algorithm (Meeus, Astronomical Algorithms, ch. 8). */
    static LocalDate easterSunday(int year) {
        int a = year % 19, b = year / 100, c = year % 100, d = b / 4, e = b % 4;
        int f = (b + 8) / 25, g = (b - f + 1) / 3, h = (19 * a + b - d - g + 15) % 30;
        int i = c / 4, k = c % 4, l = (32 + 2 * e + 2 * i - h - k) % 7, m = (a + 11 * h + 22 * l) / 451;
        int month = (h + l - 7 * m + 114) / 31, day = (h + l - 7 * m + 114) % 31 + 1;
        return LocalDate.of(year, month, day);
    }

    static void writeNights(Path file, long[][] nights, int months) throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add("month,Total (nights),Domestic (nights),Brevania (nights),Long-haul (nights)");
        for (int t = 0; t < months; t++) {
            YearMonth month = FIRST.plusMonths(t);
            String flag = t >= months - 2 ? "p" : "";
            long total = 0;
            StringBuilder cells = new StringBuilder();
            for (int m = 0; m < MARKETS.size(); m++) {
                total += nights[m][t];
                boolean gap = MARKETS.get(m).name().equals("Long-haul") && month.equals(SURVEY_GAP);
                cells.append(',').append(gap ? "" : nights[m][t] + flag);
            }
            lines.add(month + "," + total + flag + cells);
        }
        Files.write(file, lines, StandardCharsets.UTF_8);
    }

    /** Long layout, one row per month and market, as a statistics portal exports it. */
    static void writeArrivals(Path file, long[][] arrivals, int months) throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add("period,market,arrivals");
        for (int m = 0; m <= MARKETS.size(); m++) {
            for (int t = 0; t < months; t++) {
                String flag = t >= months - 2 ? "p" : "";
                long value = 0;
                if (m == MARKETS.size()) {
                    for (long[] market : arrivals) {
                        value += market[t];
                    }
                } else {
                    value = arrivals[m][t];
                }
                String name = m == MARKETS.size() ? "Total" : MARKETS.get(m).name();
                lines.add(FIRST.plusMonths(t) + "," + name + "," + value + flag);
            }
        }
        Files.write(file, lines, StandardCharsets.UTF_8);
    }

    /** Daily visitors of the Quennelmark Glassworks Museum, dates written day first. */
    static void writeMuseum(Path file, Random random) throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add("Date;Visitors");
        DateTimeFormatter dayFirst = DateTimeFormatter.ofPattern("dd/MM/yyyy", Locale.ROOT);
        for (LocalDate d = LocalDate.of(2023, 1, 1); !d.isAfter(LocalDate.of(2026, 10, 31)); d = d.plusDays(1)) {
            double weekday = switch (d.getDayOfWeek()) {
                case MONDAY -> 0.55;
                case SATURDAY -> 1.65;
                case SUNDAY -> 1.45;
                case FRIDAY -> 1.10;
                default -> 0.85;
            };
            double season = 1 + 0.45 * Math.cos(2 * Math.PI * (d.getDayOfYear() - 210) / 365.25);
            double trend = 310 * Math.pow(1.04, (d.toEpochDay() - LocalDate.of(2023, 1, 1).toEpochDay()) / 365.25);
            double value = trend * weekday * season * Math.exp(0.12 * random.nextGaussian());
            boolean closed = d.getMonthValue() == 12 && d.getDayOfMonth() == 25;
            lines.add(d.format(dayFirst) + ";" + (closed ? 0 : Math.round(value)));
        }
        Files.write(file, lines, StandardCharsets.UTF_8);
    }
}
