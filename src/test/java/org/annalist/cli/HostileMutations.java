package org.annalist.cli;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The edits {@link HostileInputPropertyTest} makes to good files: what an unlucky user (a portal
 * download cut short, a spreadsheet saved with another encoding, a hand-edited spec) or an attacker
 * would hand the tool. Every edit is drawn from the given {@link Random}, so a seed replays a case.
 * The kinds of edit are common practice in fuzzing text formats (no source).
 */
final class HostileMutations {

    /** Values a cell may take: huge, tiny, not a number, too many digits, hexadecimal, signs alone. */
    private static final String[] ODD_VALUES = {"1e308", "-1e308", "1e400", "1.5e100", "-9e99", "1e-320", "4.9e-324",
        "123456789012345678901234567890", "NaN", "Infinity", "-Infinity", "0x1p1023", "1,000,000.5", "1.2.3", "-", "+",
        "", " ", "\"\"", "null", "−5", "٣٤٥", "1e", "0", "-0", "99999999999999999999e290"};
    private static final byte[][] BOMS = {
        {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, {(byte) 0xFE, (byte) 0xFF}, {(byte) 0xFF, (byte) 0xFE},
        {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF, (byte) 0xEF, (byte) 0xBB, (byte) 0xBF}};
    private static final Pattern YEAR = Pattern.compile("(?<![0-9])(1[6-9]|20)([0-9]{2})(?![0-9])");

    private HostileMutations() {
    }

    /** Between one and four edits of a CSV, each named in {@code applied} for the failure message. */
    static byte[] csv(byte[] good, Random random, List<String> applied) {
        int kind = random.nextInt(20);
        if (kind == 0) {
            applied.add("empty file");
            return new byte[0];
        }
        if (kind == 1) {
            applied.add("binary junk");
            byte[] junk = new byte[random.nextInt(4096) + 1];
            random.nextBytes(junk);
            return junk;
        }
        List<String> lines = new ArrayList<>(Arrays.asList(new String(good, StandardCharsets.UTF_8).split("\n", -1)));
        byte[] bytes = null;
        // mostly one edit, so that many files are still read and the methods, the brief and its
        // writing meet the edited values; sometimes several
        int edits = random.nextInt(3) == 0 ? 2 + random.nextInt(3) : 1;
        for (int e = 0; e < edits; e++) {
            if (bytes != null) {
                break;  // byte-level edits come last: the text may no longer be UTF-8
            }
            int line = lines.isEmpty() ? 0 : random.nextInt(lines.size());
            switch (random.nextInt(14)) {
                case 0 -> {
                    applied.add("delete line " + line);
                    if (!lines.isEmpty()) {
                        lines.remove(line);
                    }
                }
                case 1 -> {
                    applied.add("duplicate line " + line);
                    if (!lines.isEmpty()) {
                        lines.add(line, lines.get(line));
                    }
                }
                case 2 -> {
                    int other = lines.isEmpty() ? 0 : random.nextInt(lines.size());
                    applied.add("swap lines " + line + " and " + other);
                    if (!lines.isEmpty()) {
                        String keep = lines.get(line);
                        lines.set(line, lines.get(other));
                        lines.set(other, keep);
                    }
                }
                case 3 -> {
                    String what = new String[] {",", ";", "\t", "\"", "\0", "\"\"", ",,,,", "'"}[random.nextInt(8)];
                    applied.add("insert " + printable(what) + " in line " + line);
                    lines.set(line, insert(lines.isEmpty() ? "" : lines.get(line), what, random));
                }
                case 4 -> {
                    String value = ODD_VALUES[random.nextInt(ODD_VALUES.length)];
                    applied.add("value " + printable(value) + " in line " + line);
                    lines.set(line, replaceLastField(lines.get(line), value));
                }
                case 5 -> {
                    applied.add("every value of column 2 from line " + line + " huge");
                    for (int i = Math.max(1, line); i < lines.size(); i++) {
                        lines.set(i, replaceLastField(lines.get(i), (random.nextBoolean() ? "" : "-") + "9.9e" + (95 + random.nextInt(6))));
                    }
                }
                case 6 -> {
                    int shift = new int[] {-500, -450, -1900, 8000, -2000}[random.nextInt(5)];
                    applied.add("years shifted by " + shift);
                    for (int i = 0; i < lines.size(); i++) {
                        lines.set(i, shiftYears(lines.get(i), shift));
                    }
                }
                case 7 -> {
                    applied.add("lines from " + line + " cut");
                    lines.subList(Math.min(line + 1, lines.size()), lines.size()).clear();
                }
                case 8 -> {
                    applied.add("a line of 200,000 characters at " + line);
                    lines.add(line, "2024-01," + "7".repeat(200_000));
                }
                case 9 -> {
                    applied.add("random line at " + line);
                    lines.add(line, randomText(random, 1 + random.nextInt(80)));
                }
                case 10 -> {
                    applied.add("a thousand extra columns in line " + line);
                    lines.set(line, lines.get(line) + ",1".repeat(1000));
                }
                default -> {
                    bytes = String.join("\n", lines).getBytes(StandardCharsets.UTF_8);
                    bytes = byteEdit(bytes, random, applied);
                }
            }
        }
        return bytes != null ? bytes : String.join("\n", lines).getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] byteEdit(byte[] bytes, Random random, List<String> applied) {
        switch (random.nextInt(6)) {
            case 0 -> {
                byte[] bom = BOMS[random.nextInt(BOMS.length)];
                applied.add("byte order mark of " + bom.length + " bytes");
                return concat(bom, bytes);
            }
            case 1 -> {
                applied.add("CR/LF mixed");
                ByteArrayOutputStream out = new ByteArrayOutputStream();
                for (byte b : bytes) {
                    if (b == '\n') {
                        int r = random.nextInt(3);
                        out.writeBytes(r == 0 ? new byte[] {'\r', '\n'} : r == 1 ? new byte[] {'\r'} : new byte[] {'\n'});
                    } else {
                        out.write(b);
                    }
                }
                return out.toByteArray();
            }
            case 2 -> {
                int flips = 1 + random.nextInt(20);
                applied.add(flips + " bytes flipped");
                byte[] copy = bytes.clone();
                for (int i = 0; i < flips && copy.length > 0; i++) {
                    copy[random.nextInt(copy.length)] ^= (byte) (1 << random.nextInt(8));
                }
                return copy;
            }
            case 3 -> {
                applied.add("Latin-1 bytes");
                byte[] copy = bytes.clone();
                for (int i = 0; i < 3 && copy.length > 0; i++) {
                    copy[random.nextInt(copy.length)] = (byte) (0xE0 + random.nextInt(32));
                }
                return copy;
            }
            case 4 -> {
                int cut = bytes.length == 0 ? 0 : random.nextInt(bytes.length);
                applied.add("cut at byte " + cut);
                return Arrays.copyOf(bytes, cut);
            }
            default -> {
                applied.add("NULs");
                byte[] copy = bytes.clone();
                for (int i = 0; i < 5 && copy.length > 0; i++) {
                    copy[random.nextInt(copy.length)] = 0;
                }
                return copy;
            }
        }
    }

    /** A spec of one to three briefs of {@code data}, edited by one to three edits from a hostile list. */
    static String spec(String data, Random random, List<String> applied) {
        List<String> entries = new ArrayList<>();
        int briefs = 1 + random.nextInt(3);
        for (int b = 0; b < briefs; b++) {
            entries.add("  - data: " + data + "\n    title: Brief " + b + "\n    output: brief-" + b + "-{series}.pdf\n"
                    + "    generated_at: 2026-11-20T08:00:00Z\n    horizon: 0\n");
        }
        int edits = random.nextInt(4);
        String head = "briefs:\n";
        for (int e = 0; e < edits; e++) {
            int at = random.nextInt(entries.size());
            String entry = entries.get(at);
            int kind = random.nextInt(16);
            String edited = switch (kind) {
                case 0 -> entry + "    colour: red\n";
                case 1 -> entry.replace("title: Brief " + at, "title: [1, 2, {a: b}]");
                case 2 -> entry.replace("horizon: 0", "horizon: many");
                case 3 -> entry.replace("data: " + data, "data: ../outside.csv");
                case 4 -> entry.replace("output: brief-", "output: ../../escaped-");
                case 5 -> entry.replace("output: brief-", "output: link/escaped-");
                case 6 -> entry.replace("title: Brief " + at, "title: &t Brief\n    organisation: *t");
                case 7 -> entry + "    series: [" + "s, ".repeat(3000) + "s]\n";
                case 8 -> entry.replace("data: " + data, "data: \"" + data + "\\0.csv\"");
                case 9 -> entry.replace("data: " + data, "data: /dev/zero");
                case 10 -> entry + "    logo: ../outside.csv\n";
                case 11 -> entry + "    templates: ../\n";
                case 12 -> entry + "    holidays: " + data + "\n";
                case 13 -> entry + "    period: 1066-13\n";
                case 14 -> entry + "    measure: {a: [b, c]}\n";
                default -> entry.replace("output: brief-" + at + "-{series}.pdf", "output: {series}/{period}/" + "x".repeat(300) + ".pdf");
            };
            applied.add("entry " + at + " edit " + kind);
            entries.set(at, edited);
        }
        StringBuilder spec = new StringBuilder(head);
        entries.forEach(spec::append);
        switch (random.nextInt(12)) {
            case 0 -> {
                applied.add("1,001 briefs");
                spec.append(("  - data: " + data + "\n").repeat(1001));
            }
            case 1 -> {
                applied.add("nested 5,000 deep");
                spec.append("extra: ").append("[".repeat(5000)).append("]".repeat(5000)).append('\n');
            }
            case 2 -> {
                applied.add("a top-level key repeated");
                spec.append("briefs: 3\n");
            }
            case 3 -> {
                applied.add("a tab and a stray colon");
                spec.insert(random.nextInt(spec.length()), "\t: ");
            }
            default -> {
                // the edited entries alone
            }
        }
        return spec.toString();
    }

    /** One to three edits of the bundled brief template. */
    static String template(String good, Random random, List<String> applied) {
        StringBuilder text = new StringBuilder(good);
        int edits = random.nextInt(3) == 0 ? 2 + random.nextInt(2) : 1;
        for (int e = 0; e < edits; e++) {
            int body = text.indexOf("<body");
            int at = body < 0 ? random.nextInt(text.length() + 1) : text.indexOf(">", body) + 1;
            switch (random.nextInt(12)) {
                case 0 -> insert(applied, text, at, "<#if brief.title??>unclosed");
                case 1 -> insert(applied, text, at, "<p>${brief.noSuchThing}</p>");
                case 2 -> insert(applied, text, at, "<p><#list 1.. as i>${i} </#list></p>");
                case 3 -> insert(applied, text, at, "<img src=\"file:///etc/passwd\" alt=\"x\"/>");
                case 4 -> insert(applied, text, at, "<img src=\"../outside.csv\" alt=\"x\"/>");
                case 5 -> insert(applied, text, at, "<img src=\"http://127.0.0.1:9/x.png\" alt=\"x\"/>");
                case 6 -> insert(applied, text, at, "<#include \"../../outside.csv\">");
                case 7 -> insert(applied, text, at, "<#macro m><@m/></#macro><@m/>");
                case 8 -> insert(applied, text, at, "<p>${\"freemarker.template.utility.Execute\"?new()(\"id\")}</p>");
                case 9 -> {
                    int line = random.nextInt(Math.max(1, (int) text.chars().filter(c -> c == '\n').count()));
                    applied.add("line " + line + " deleted");
                    int start = 0;
                    for (int l = 0; l < line; l++) {
                        start = text.indexOf("\n", start) + 1;
                    }
                    int end = text.indexOf("\n", start);
                    text.delete(start, end < 0 ? text.length() : end + 1);
                }
                case 10 -> {
                    int cut = random.nextInt(text.length() + 1);
                    applied.add("cut at " + cut);
                    text.setLength(cut);
                }
                default -> {
                    int where = random.nextInt(text.length() + 1);
                    String what = new String[] {"<", ">", "${", "<#", "&", "\0", "]]>", "</div>"}[random.nextInt(8)];
                    applied.add(printable(what) + " at " + where);
                    text.insert(where, what);
                }
            }
        }
        return text.toString();
    }

    /** One edit of the bundled style sheet: a URL outside the folder (a font there is {@code ../outside.ttf}), or a broken rule. */
    static String css(String good, Random random, List<String> applied) {
        String edit = new String[] {"@import url(\"file:///etc/passwd\");\n", "body { background: url(\"http://127.0.0.1:9/b.png\") }\n",
            "@font-face { font-family: x; src: url(\"/dev/zero\") }\nbody { font-family: x }\n",
            "@font-face { font-family: x; src: url(\"../outside.ttf\") }\nbody, p, td { font-family: x !important }\n",
            "body { color: \n", "}}}{{{\n"}[random.nextInt(6)];
        applied.add("css: " + printable(edit.strip()));
        return edit + good;
    }

    private static void insert(List<String> applied, StringBuilder text, int at, String what) {
        applied.add("insert " + what);
        text.insert(Math.max(0, Math.min(at, text.length())), what);
    }

    private static String insert(String line, String what, Random random) {
        int at = line.isEmpty() ? 0 : random.nextInt(line.length() + 1);
        return line.substring(0, at) + what + line.substring(at);
    }

    private static String replaceLastField(String line, String value) {
        int comma = Math.max(line.lastIndexOf(','), Math.max(line.lastIndexOf(';'), line.lastIndexOf('\t')));
        return comma < 0 ? value : line.substring(0, comma + 1) + value;
    }

    private static String shiftYears(String line, int shift) {
        Matcher m = YEAR.matcher(line);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            int year = Integer.parseInt(m.group());
            m.appendReplacement(out, String.format("%04d", Math.max(1, year + shift)));
        }
        m.appendTail(out);
        return out.toString();
    }

    private static String randomText(Random random, int length) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < length; i++) {
            s.appendCodePoint(random.nextInt(4) == 0 ? 0x20 + random.nextInt(0x2FF) : "0123456789,;-.:\"/ eE".charAt(random.nextInt(20)));
        }
        return s.toString();
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] all = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }

    static String printable(String s) {
        return s.replace("\0", "\\0").replace("\t", "\\t").replace("\r", "\\r").replace("\n", "\\n");
    }
}
