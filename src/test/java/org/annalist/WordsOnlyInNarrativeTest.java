package org.annalist;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The narrative is the only place that words what the tool found: between the data and the
 * document (analysis, findings, chart, render) no string literal holds a phrase of three or more
 * words, except the messages of exceptions, which report a programming or input error, not a finding.
 */
class WordsOnlyInNarrativeTest {

    private static final Path SOURCES = Path.of("src/main/java/org/annalist");
    private static final List<String> STAGES = List.of("analysis", "findings", "chart", "render");
    private static final Pattern LITERAL = Pattern.compile("\"((?:[^\"\\\\]|\\\\.)*)\"");
    private static final Pattern PHRASE = Pattern.compile("[A-Za-z]{2,}(?:[ -][A-Za-z']{2,}){2,}");
    private static final Pattern MESSAGE = Pattern.compile("throw |Exception\\(|Pattern\\.compile\\(");

    @Test
    void noPhraseOutsideTheNarrative() throws IOException {
        List<String> phrases = new ArrayList<>();
        for (String stage : STAGES) {
            try (Stream<Path> files = Files.walk(SOURCES.resolve(stage))) {
                for (Path file : files.filter(p -> p.toString().endsWith(".java")).sorted().toList()) {
                    phrases.addAll(phrases(file.toString(), Files.readString(file)));
                }
            }
        }
        assertThat(phrases).isEmpty();
    }

    @Test
    void aPlantedSentenceIsFoundAndAnExceptionMessageIsNot() {
        String source = """
                class Planted {
                    String note() { return "the series is shorter than " + 3 + " years"; }
                    void check(int n) {
                        if (n < 3) {
                            throw new IllegalArgumentException("needs at least three values, got " + n);
                        }
                    }
                }
                """;
        assertThat(phrases("Planted.java", source)).singleElement().asString().contains("the series is shorter than");
    }

    /** The phrases of a source's string literals, comments left out, with where they are. */
    static List<String> phrases(String file, String source) {
        String code = withoutComments(source);
        List<String> found = new ArrayList<>();
        Matcher literal = LITERAL.matcher(code);
        while (literal.find()) {
            if (!PHRASE.matcher(literal.group(1)).find()) {
                continue;
            }
            int start = Math.max(code.lastIndexOf(';', literal.start()), Math.max(code.lastIndexOf('{', literal.start()),
                    code.lastIndexOf('}', literal.start())));
            int end = code.indexOf(';', literal.end());
            String statement = code.substring(start + 1, end < 0 ? code.length() : end);
            if (!MESSAGE.matcher(statement).find()) {
                int line = code.substring(0, literal.start()).split("\n", -1).length;
                found.add(file + ":" + line + ": \"" + literal.group(1) + "\"");
            }
        }
        return found;
    }

    /** Comments blanked out, line breaks kept, so that javadoc and the lines' numbers stay as they were. */
    private static String withoutComments(String source) {
        StringBuilder out = new StringBuilder(source.length());
        int i = 0;
        boolean inString = false;
        while (i < source.length()) {
            char c = source.charAt(i);
            if (inString) {
                out.append(c);
                if (c == '\\' && i + 1 < source.length()) {
                    out.append(source.charAt(++i));
                } else if (c == '"') {
                    inString = false;
                }
                i++;
            } else if (source.startsWith("//", i)) {
                while (i < source.length() && source.charAt(i) != '\n') {
                    i++;
                }
            } else if (source.startsWith("/*", i)) {
                int close = source.indexOf("*/", i + 2);
                int to = close < 0 ? source.length() : close + 2;
                source.substring(i, to).chars().filter(ch -> ch == '\n').forEach(ch -> out.append('\n'));
                i = to;
            } else if (c == '\'') {
                int close = source.indexOf('\'', i + (source.charAt(i + 1) == '\\' ? 3 : 2));
                out.append(source, i, close + 1);   // a character literal, such as '"', starts no string
                i = close + 1;
            } else {
                inString = c == '"';
                out.append(c);
                i++;
            }
        }
        return out.toString();
    }
}
