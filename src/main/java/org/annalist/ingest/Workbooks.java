package org.annalist.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import javax.xml.stream.XMLStreamException;
import org.annalist.series.Series;

/**
 * Reads a workbook ({@code .xlsx}, {@code .xlsm}, {@code .ods}), recognised by its content rather than its
 * name: one sheet's rows go, as text cells, through the same reading as the rows of a CSV file
 * ({@link RowReader}: title rows, notes below, wide or long, year × month grids, transposed tables,
 * flags, missing markers). The sheet is the one named ({@code --sheet}), or the only one that holds a
 * time series. Every problem names the sheet and the cell.
 */
final class Workbooks {

    /** What a file's first bytes say it is. */
    enum Magic { ZIP, COMPOUND, NONE }

    /** A zip's local file header signature (APPNOTE.TXT §4.3.7), which begins every xlsx and ods package. */
    private static final byte[] ZIP = {'P', 'K', 3, 4};
    /**
     * The signature of a compound file ([MS-CFB] §2.2): an old binary workbook (.xls), or an OOXML workbook
     * encrypted with a password, whose package is then a stream of a compound file ([MS-OFFCRYPTO] §2.3.4,
     * the EncryptionInfo and EncryptedPackage streams).
     */
    private static final byte[] COMPOUND = {(byte) 0xD0, (byte) 0xCF, 0x11, (byte) 0xE0, (byte) 0xA1, (byte) 0xB1, 0x1A,
            (byte) 0xE1};
    private static final byte[] ENCRYPTION_INFO = "EncryptionInfo".getBytes(StandardCharsets.UTF_16LE);
    private static final String EXPECTED = "expected a CSV file, or an .xlsx, .xlsm or .ods workbook";

    private Workbooks() {
    }

    static Magic magic(byte[] head) {
        return startsWith(head, ZIP) ? Magic.ZIP : startsWith(head, COMPOUND) ? Magic.COMPOUND : Magic.NONE;
    }

    /** The series of {@code file} when it is a workbook (or a zip or compound file, refused here); empty when it is text. */
    static Optional<ReadResult> read(Path file, ReadOptions options) {
        return read(file, file.toString(), options);
    }

    /** As {@link #read(Path, ReadOptions)}, the file named {@code name} in messages and in the result. */
    static Optional<ReadResult> read(Path file, String name, ReadOptions options) {
        byte[] head;
        try (InputStream in = InputFiles.open(file, options.maxInputBytes(), "a CSV file")) {
            head = in.readNBytes(8);
        } catch (IOException | DataProblemException e) {
            return Optional.empty();   // the reading of text says why
        }
        Magic magic = magic(head);
        if (magic == Magic.NONE) {
            return Optional.empty();
        }
        if (magic == Magic.COMPOUND) {
            throw compound(name, InputFiles.read(file, options.maxInputBytes(), "a CSV file"));
        }
        try {
            long size = Files.size(file);
            String sha256 = sha256(file);
            try (ZipParts parts = ZipParts.of(file, size)) {
                return Optional.of(read(name, parts, sha256, options));
            }
        } catch (IOException | RuntimeException e) {
            throw e instanceof DataProblemException problem ? problem : damaged(name, "", e);
        }
    }

    /** As {@link #read(Path, ReadOptions)}, for bytes in memory called {@code name}. */
    static Optional<ReadResult> read(String name, byte[] bytes, ReadOptions options) {
        Magic magic = magic(bytes);
        if (magic == Magic.NONE) {
            return Optional.empty();
        }
        if (magic == Magic.COMPOUND) {
            throw compound(name, bytes);
        }
        try (ZipParts parts = ZipParts.of(bytes)) {
            return Optional.of(read(name, parts, sha256(bytes), options));
        } catch (IOException | RuntimeException e) {
            throw e instanceof DataProblemException problem ? problem : damaged(name, "", e);
        }
    }

    /** Whether a zip package holds a workbook: SpreadsheetML's workbook part, or an OpenDocument spreadsheet's mimetype. */
    static boolean isWorkbookPackage(Path file) {
        try (ZipParts parts = ZipParts.of(file, Files.size(file))) {
            return parts.has(XlsxBook.WORKBOOK) || mimetype(parts).startsWith(OdsBook.MIMETYPE);
        } catch (IOException | RuntimeException unreadable) {
            return false;
        }
    }

    private static DataProblemException compound(String name, byte[] bytes) {
        boolean encrypted = indexOf(bytes, ENCRYPTION_INFO) >= 0;
        return problem(name, encrypted ? "is a password-protected (encrypted) workbook, which cannot be read; expected "
                + "the workbook saved without a password (or its sheet exported as CSV)"
                : "is an older binary workbook (.xls) or another compound file, which is not read; expected the "
                + "workbook saved as .xlsx or .ods (or its sheet exported as CSV)");
    }

    private static ReadResult read(String name, ZipParts parts, String sha256, ReadOptions options) throws IOException {
        Workbook book;
        if (parts.isEmpty()) {
            throw damaged(name, "", new IOException("it holds no parts"));
        }
        if (parts.has(XlsxBook.WORKBOOK)) {   // ECMA-376 Part 1 §8.3 / §12.2: the workbook part of a SpreadsheetML package
            book = new XlsxBook(parts, parts.has("xl/vbaProject.bin") ? "xlsm" : "xlsx");
        } else if (mimetype(parts).startsWith(OdsBook.MIMETYPE)) {   // ODF 1.2 Part 3 §3.3, the mimetype file
            if (manifestSaysEncrypted(parts)) {
                throw problem(name, "is a password-protected (encrypted) workbook, which cannot be read; expected the "
                        + "workbook saved without a password (or its sheet exported as CSV)");
            }
            book = new OdsBook(parts);
        } else {
            throw problem(name, "is a zip archive but not a workbook (it has neither xl/workbook.xml nor an OpenDocument "
                    + "spreadsheet's mimetype); " + EXPECTED);
        }
        List<DataProblem> notes = new ArrayList<>();
        String extension = extension(name);
        boolean named = book.format().equals("ods") ? extension.equals("ods") : extension.equals("xlsx")
                || extension.equals("xlsm");
        if (!named) {
            notes.add(new DataProblem(name, 0, 0, "the file is an " + book.format() + " workbook despite its name, and "
                    + "was read as one"));
        }
        Workbook.SheetRef sheet;
        try {
            sheet = SheetChoice.choose(name, book, options);
        } catch (XMLStreamException | RuntimeException e) {
            if (e instanceof DataProblemException problem) {
                throw problem;
            }
            throw damaged(name, "", e);
        }
        return new SheetReading(name, book, sheet, options, sha256, notes).read();
    }

    /** One sheet read through {@link RowReader}, its problems located by sheet and cell. */
    private static final class SheetReading implements SheetSink {
        private final String name;
        private final Workbook book;
        private final Workbook.SheetRef sheet;
        private final ReadOptions options;
        private final String sha256;
        private final List<DataProblem> notes;
        private final ProblemLog log;
        private final RowReader rows;
        private final BitSet hiddenColumns = new BitSet();
        private final BitSet usedColumns = new BitSet();
        private final List<Integer> hiddenRows = new ArrayList<>();
        private int hiddenRowCount;
        private int width;

        SheetReading(String name, Workbook book, Workbook.SheetRef sheet, ReadOptions options, String sha256,
                     List<DataProblem> notes) {
            this.name = name;
            this.book = book;
            this.sheet = sheet;
            this.options = options;
            this.sha256 = sha256;
            this.notes = notes;
            this.log = new ProblemLog(name, sheet.name());
            // A workbook's numbers carry no decimal mark (they are written here with a point); the mark asked
            // for would misread them, and numbers stored as text show their own.
            ReadOptions reading = new ReadOptions(options.dateOrder(), Optional.empty(), options.aggregation(),
                    options.maxInputBytes(), options.sheet());
            this.rows = new RowReader(reading, log, baseName(name), 1024);
        }

        ReadResult read() {
            try {
                book.read(sheet, this, true);
            } catch (IOException | XMLStreamException | RuntimeException e) {
                if (e instanceof DataProblemException problem) {
                    throw problem;
                }
                throw damaged(name, sheet.name(), e);
            }
            warnHidden();
            RowReader.Read read = rows.end();
            List<Series> series = Aggregator.aggregateAll(read.series(), options.aggregation(), log);
            log.throwIfErrors();
            List<DataProblem> warnings = new ArrayList<>(notes);
            warnings.addAll(log.warnings());
            return new ReadResult(name, sha256, "UTF-8", ',', read.rowsRead(), read.layout(), read.periodFormat(),
                    read.dateOrder(), read.decimalMark(), options.aggregation(), series, warnings,
                    Optional.of(new ReadResult.Sheet(book.format(), sheet.name(), sheet.number())));
        }

        @Override
        public boolean row(int number, String[] cells, boolean hidden) {
            width = Math.max(width, cells.length);
            String[] padded = cells.length == width ? cells : java.util.Arrays.copyOf(cells, width);
            for (int c = 0; c < padded.length; c++) {
                if (padded[c] == null) {
                    padded[c] = "";
                } else if (!padded[c].isEmpty()) {
                    usedColumns.set(c + 1);
                }
            }
            if (hidden) {
                if (hiddenRows.size() < 5) {
                    hiddenRows.add(number);
                }
                hiddenRowCount++;
            }
            rows.row(new CsvRows.Row(number, new CsvRows.Fields(padded)));
            return true;
        }

        @Override
        public void hiddenColumn(int column) {
            hiddenColumns.set(column);
        }

        @Override
        public void cellNote(int row, int column, String message) {
            log.warn(row, column, message);
        }

        /** Hidden rows and columns are read like the others: the workbook's owner hid them from view, not from the data. */
        private void warnHidden() {
            if (hiddenRowCount > 0) {
                String more = hiddenRowCount > hiddenRows.size() ? " and " + (hiddenRowCount - hiddenRows.size()) + " more" : "";
                log.warn(hiddenRows.get(0), 0, (hiddenRowCount == 1 ? "this row is hidden" : "rows "
                        + String.join(", ", hiddenRows.stream().map(String::valueOf).toList()) + more + " are hidden")
                        + " in the workbook; read like the others");
            }
            BitSet hiddenUsed = (BitSet) hiddenColumns.clone();
            hiddenUsed.and(usedColumns);
            if (!hiddenUsed.isEmpty()) {
                List<String> letters = hiddenUsed.stream().limit(5).mapToObj(DataProblem::columnLetters).toList();
                int count = hiddenUsed.cardinality();
                log.warn(0, 0, (count == 1 ? "column " + letters.get(0) + " is hidden" : "columns " + String.join(", ", letters)
                        + (count > letters.size() ? " and " + (count - letters.size()) + " more" : "") + " are hidden")
                        + " in the workbook; read like the others");
            }
        }
    }

    static DataProblemException problem(String name, String message) {
        return new DataProblemException(new DataProblem(name, 0, 0, message));
    }

    /** A workbook whose parts cannot be read as the formats define them. */
    static DataProblemException damaged(String name, String sheet, Exception cause) {
        String reason = cause instanceof ZipParts.TooLarge ? cause.getMessage()
                : cause instanceof XMLStreamException x ? "its XML is malformed" + (x.getLocation() != null
                ? " at line " + x.getLocation().getLineNumber() : "")
                : cause instanceof java.util.zip.ZipException z ? "not a readable zip: " + z.getMessage()
                : cause.getMessage() == null ? cause.getClass().getSimpleName() : cause.getMessage();
        return new DataProblemException(new DataProblem(name, 0, 0, "is a damaged workbook (" + reason
                + "); expected a workbook as a spreadsheet program saves it", sheet));
    }

    private static String mimetype(ZipParts parts) throws IOException {
        Optional<InputStream> in = parts.open("mimetype");
        if (in.isEmpty()) {
            return "";
        }
        try (InputStream mimetype = in.get()) {
            return new String(mimetype.readNBytes(200), StandardCharsets.US_ASCII).trim();
        }
    }

    /** ODF 1.2 Part 3 §4.8: an encrypted part is listed in the manifest with manifest:encryption-data. */
    private static boolean manifestSaysEncrypted(ZipParts parts) throws IOException {
        Optional<InputStream> in = parts.open("META-INF/manifest.xml");
        if (in.isEmpty()) {
            return false;
        }
        try (InputStream manifest = in.get()) {
            return new String(manifest.readNBytes(1 << 20), StandardCharsets.UTF_8).contains("encryption-data");
        }
    }

    private static String extension(String name) {
        String base = Path.of(name).getFileName().toString();
        int dot = base.lastIndexOf('.');
        return dot < 0 ? "" : base.substring(dot + 1).toLowerCase(Locale.ROOT);
    }

    static String baseName(String fileName) {
        String base = Path.of(fileName).getFileName().toString();
        int dot = base.lastIndexOf('.');
        return dot > 0 ? base.substring(0, dot) : base;
    }

    private static String sha256(Path file) throws IOException {
        MessageDigest digest = sha256();
        try (InputStream in = new DigestInputStream(Files.newInputStream(file), digest)) {
            in.transferTo(java.io.OutputStream.nullOutputStream());
        }
        return HexFormat.of().formatHex(digest.digest());
    }

    private static String sha256(byte[] bytes) {
        return HexFormat.of().formatHex(sha256().digest(bytes));
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }

    private static boolean startsWith(byte[] bytes, byte[] prefix) {
        if (bytes.length < prefix.length) {
            return false;
        }
        for (int i = 0; i < prefix.length; i++) {
            if (bytes[i] != prefix[i]) {
                return false;
            }
        }
        return true;
    }

    private static int indexOf(byte[] bytes, byte[] pattern) {
        outer:
        for (int i = 0; i + pattern.length <= bytes.length; i++) {
            for (int j = 0; j < pattern.length; j++) {
                if (bytes[i + j] != pattern[j]) {
                    continue outer;
                }
            }
            return i;
        }
        return -1;
    }
}
