package org.annalist.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * What a mistyped command or option was most likely meant to be: the nearest name by edit distance
 * (a letter left out, added, changed, or two swapped count one each), or the one name it begins.
 * Our own rule rather than picocli's similarity, so that a suggestion is one name, predictable, and
 * none when nothing is near.
 */
final class Suggestions {

    private Suggestions() {
    }

    /** The message for arguments picocli could not place: which word, and what was meant. */
    static String unmatched(CommandLine.UnmatchedArgumentException e) {
        CommandLine cli = e.getCommandLine();
        CommandSpec spec = cli.getCommandSpec();
        String word = e.getUnmatched().get(0);
        if (word.startsWith("-")) {
            String option = word.contains("=") ? word.substring(0, word.indexOf('=')) : word;
            return "unknown option '" + option + "'" + nearest(option, optionNames(spec))
                    .map(n -> "; did you mean '" + n + "'?").orElse("");
        }
        if (!spec.subcommands().isEmpty() && cli.getParent() == null) {
            List<String> commands = new ArrayList<>(spec.subcommands().keySet());
            return "'" + word + "' is not a command" + nearest(word, commands).map(n -> "; did you mean '" + n + "'?")
                    .orElse("; the commands are " + String.join(", ", mainNames(spec)));
        }
        return e.getMessage();
    }

    private static List<String> optionNames(CommandSpec spec) {
        List<String> names = new ArrayList<>();
        for (OptionSpec option : spec.options()) {
            names.addAll(List.of(option.names()));
        }
        return names;
    }

    private static List<String> mainNames(CommandSpec spec) {
        return spec.subcommands().values().stream().map(c -> c.getCommandSpec().name()).distinct().toList();
    }

    /**
     * The name nearest to {@code typed}, if near enough to be what was meant: within one edit for a
     * word of 3 or 4 letters, two up to 8, three beyond (dashes not counted; a word of one or two
     * letters is near every short option, and gets no guess); else the only name that begins with
     * it (at least 3 letters typed: {@code --out} for {@code --output}).
     */
    static Optional<String> nearest(String typed, List<String> names) {
        String word = typed.toLowerCase(Locale.ROOT);
        int letters = word.replaceFirst("^-+", "").length();
        int allowed = letters <= 2 ? 0 : letters <= 4 ? 1 : letters <= 8 ? 2 : 3;
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String name : names) {
            int d = distance(word, name.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                best = name;
                bestDistance = d;
            }
        }
        if (best != null && bestDistance <= allowed) {
            return Optional.of(best);
        }
        if (letters >= 3) {
            List<String> begun = names.stream().filter(n -> n.toLowerCase(Locale.ROOT).startsWith(word)).toList();
            if (begun.size() == 1) {
                return Optional.of(begun.get(0));
            }
        }
        return Optional.empty();
    }

    /** Edit distance with adjacent transpositions (the optimal string alignment distance). */
    static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }
}
