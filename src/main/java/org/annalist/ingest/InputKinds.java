package org.annalist.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * Whether a file of a folder is one this tool reads, judged by its content as a single input is
 * ({@link SeriesFileReader}): a workbook (a zip with a SpreadsheetML workbook part or an OpenDocument
 * spreadsheet's mimetype), or text: a table, SDMX-CSV, the bulk tab layout, JSON-stat. A file of another
 * kind (a picture, a PDF, a word-processing document, notes) is left out with the reason, so that a batch
 * over a folder briefs what it can and says what it skipped; a file that is data but broken is not left
 * out here: its reading fails with its own problems.
 */
public final class InputKinds {

    /** The names under which text is data without a look at it (common practice, no source). */
    private static final Set<String> DATA_EXTENSIONS = Set.of("csv", "tsv", "tab", "json");
    private static final Set<String> WORKBOOK_EXTENSIONS = Set.of("xlsx", "xlsm", "ods", "xls");
    private static final int HEAD = 8192;

    private InputKinds() {
    }

    /**
     * Why {@code file} is not read as data, or empty when it is (to be read, and to fail with its own
     * problems if it is broken).
     */
    public static Optional<String> whyNotRead(Path file, ReadOptions options) {
        String extension = extension(file);
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(HEAD);
        } catch (IOException e) {
            return Optional.empty();   // the reading says why it cannot be read
        }
        switch (Workbooks.magic(head)) {
            case ZIP -> {
                if (WORKBOOK_EXTENSIONS.contains(extension) || Workbooks.isWorkbookPackage(file)) {
                    return Optional.empty();
                }
                return Optional.of("a zip archive but not a workbook");
            }
            case COMPOUND -> {
                return WORKBOOK_EXTENSIONS.contains(extension) ? Optional.empty()
                        : Optional.of("a compound file (an older office document), not a workbook this tool reads");
            }
            default -> {
                // text from here on
            }
        }
        if (binary(head)) {
            return WORKBOOK_EXTENSIONS.contains(extension) || DATA_EXTENSIONS.contains(extension) ? Optional.empty()
                    : Optional.of("binary data, neither text nor a workbook");
        }
        if (DATA_EXTENSIONS.contains(extension)
                || PublishedFormat.recognise(new String(head, StandardCharsets.UTF_8)).isPresent()) {
            return Optional.empty();
        }
        try {   // text under another name (notes.md, a .yaml spec): data only if it reads as data
            new SeriesFileReader(options).read(file);
            return Optional.empty();
        } catch (DataProblemException notData) {
            return Optional.of("not a table of dates and values (" + notData.problems().get(0).message() + ")");
        }
    }

    /** A zero byte among the first bytes, and no UTF-16 byte-order mark: what text never has. */
    private static boolean binary(byte[] head) {
        if (head.length >= 2 && ((head[0] == (byte) 0xFF && head[1] == (byte) 0xFE) || (head[0] == (byte) 0xFE
                && head[1] == (byte) 0xFF))) {
            return false;
        }
        for (byte b : head) {
            if (b == 0) {
                return true;
            }
        }
        return false;
    }

    private static String extension(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot < 0 ? "" : name.substring(dot + 1).toLowerCase(Locale.ROOT);
    }
}
