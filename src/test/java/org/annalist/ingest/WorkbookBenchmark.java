package org.annalist.ingest;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

/**
 * Prints how long reading a workbook takes and how much memory it needs: a 10,000-row xlsx and ods
 * (a daily series from 2000, a date column and three markets), read in this JVM (cold, then the median
 * of five warm reads, with the heap's peak) and by {@code check} in a fresh JVM with a 64 MB heap (wall
 * time and the process's peak resident memory, Linux). With {@code --big} it also writes a long-layout
 * xlsx of 1,000,000 rows (a date, 100 markets, four value columns: 400 series of 10,000 days; about 50 MB)
 * and reads it with {@code check} in a 512 MB heap, to show that a big workbook is read streaming: memory
 * follows the 4 million values kept, as with a CSV file. Invented data (seeded); from the top folder,
 * after {@code mvn -q -B -DskipTests package}:
 * {@code java -cp target/annalist.jar:target/test-classes org.annalist.ingest.WorkbookBenchmark [--big]}.
 */
public final class WorkbookBenchmark {

    private WorkbookBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Files.createTempDirectory("annalist-workbook-bench");
        WorkbookFiles.Sheet sheet = new WorkbookFiles.Sheet("Nights").row("Date", "Domestic", "Brevania", "Long-haul");
        Random random = new Random(18);
        java.time.LocalDate day = java.time.LocalDate.of(2000, 1, 1);
        for (int r = 0; r < 10_000; r++) {
            sheet.row("D:" + day.plusDays(r), String.valueOf(1000 + random.nextInt(500)),
                    String.format(Locale.ROOT, "%.1f", 200 + random.nextDouble() * 50), String.valueOf(50 + random.nextInt(20)));
        }
        Path xlsx = Files.write(folder.resolve("nights-10k.xlsx"), WorkbookFiles.xlsx(false, sheet));
        Path ods = Files.write(folder.resolve("nights-10k.ods"), WorkbookFiles.ods(sheet));
        for (Path file : List.of(xlsx, ods)) {
            inProcess(file);
            freshJvm(file, "64m");
        }
        if (List.of(args).contains("--big")) {
            Path big = folder.resolve("nights-1m.xlsx");
            writeBig(big, 1_000_000, 4);
            freshJvm(big, "512m");
        }
        try (var files = Files.list(folder)) {
            for (Path file : files.toList()) {
                Files.delete(file);
            }
        }
        Files.delete(folder);
    }

    private static void inProcess(Path file) {
        SeriesFileReader reader = new SeriesFileReader(ReadOptions.defaults());
        long start = System.nanoTime();
        ReadResult first = reader.read(file);
        double cold = (System.nanoTime() - start) / 1e6;
        List<Double> warm = new ArrayList<>();
        List<MemoryPoolMXBean> heap = ManagementFactory.getMemoryPoolMXBeans().stream()
                .filter(p -> p.getType() == MemoryType.HEAP).toList();
        long peak = 0;
        for (int i = 0; i < 5; i++) {
            System.gc();
            heap.forEach(MemoryPoolMXBean::resetPeakUsage);
            long before = heap.stream().mapToLong(p -> p.getUsage().getUsed()).sum();
            long t = System.nanoTime();
            reader.read(file);
            warm.add((System.nanoTime() - t) / 1e6);
            peak = Math.max(peak, heap.stream().mapToLong(p -> p.getPeakUsage().getUsed()).sum() - before);
        }
        warm.sort(null);
        System.out.printf(Locale.ROOT, "%s (%d KB, %d rows, %d series): in-process read %.0f ms cold, %.0f ms warm "
                        + "(median of 5), heap peak above the start %.1f MB%n", file.getFileName(), Files.exists(file)
                        ? fileKb(file) : 0, first.rowsRead(), first.series().size(), cold, warm.get(2), peak / 1048576.0);
    }

    private static long fileKb(Path file) {
        try {
            return Files.size(file) / 1024;
        } catch (IOException e) {
            return 0;
        }
    }

    /** {@code check FILE} in a new JVM with the heap given: wall time, and peak resident memory read from /proc. */
    private static void freshJvm(Path file, String heap) throws IOException, InterruptedException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder builder = new ProcessBuilder(java, "-Xmx" + heap, "-cp", System.getProperty("java.class.path"),
                "org.annalist.cli.Main", "check", file.toString()).redirectErrorStream(true)
                .redirectOutput(ProcessBuilder.Redirect.DISCARD);
        long start = System.nanoTime();
        Process process = builder.start();
        long peakKb = 0;
        Path status = Path.of("/proc", String.valueOf(process.pid()), "status");
        while (process.isAlive()) {
            try {
                for (String line : Files.readAllLines(status)) {
                    if (line.startsWith("VmHWM:")) {
                        peakKb = Math.max(peakKb, Long.parseLong(line.replaceAll("\\D", "")));
                    }
                }
            } catch (IOException | NumberFormatException gone) {
                // the process ended between the check and the read
            }
            Thread.sleep(10);
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        System.out.printf(Locale.ROOT, "%s: check in a fresh JVM (-Xmx%s) exit %d, %.2f s wall, peak resident %.0f MB%n",
                file.getFileName(), heap, process.exitValue(), seconds, peakKb / 1024.0);
    }

    /** A long-layout xlsx (date, market, ten value columns) written as it streams, numbers only. */
    private static void writeBig(Path file, int rows, int values) throws IOException {
        try (OutputStream out = Files.newOutputStream(file); ZipOutputStream zip = new ZipOutputStream(out)) {
            put(zip, "xl/workbook.xml", "<workbook xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\" "
                    + "xmlns:r=\"http://schemas.openxmlformats.org/officeDocument/2006/relationships\"><sheets>"
                    + "<sheet name=\"Nights\" sheetId=\"1\" r:id=\"rId1\"/></sheets></workbook>");
            put(zip, "xl/_rels/workbook.xml.rels", "<Relationships xmlns=\"http://schemas.openxmlformats.org/package/2006/"
                    + "relationships\"><Relationship Id=\"rId1\" Type=\"http://schemas.openxmlformats.org/officeDocument/"
                    + "2006/relationships/worksheet\" Target=\"worksheets/sheet1.xml\"/></Relationships>");
            put(zip, "xl/styles.xml", "<styleSheet xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\">"
                    + "<cellXfs><xf numFmtId=\"0\"/><xf numFmtId=\"14\"/></cellXfs></styleSheet>");
            zip.putNextEntry(new ZipEntry("xl/worksheets/sheet1.xml"));
            Writer xml = new BufferedWriter(new OutputStreamWriter(zip, StandardCharsets.UTF_8), 1 << 16);
            xml.write("<worksheet xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"><sheetData>");
            xml.write("<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>Date</t></is></c><c r=\"B1\" t=\"inlineStr\"><is>"
                    + "<t>Market</t></is></c>");
            for (int v = 0; v < values; v++) {
                xml.write("<c r=\"" + DataProblem.columnLetters(v + 3) + "1\" t=\"inlineStr\"><is><t>Measure " + (v + 1)
                        + "</t></is></c>");
            }
            xml.write("</row>");
            Random random = new Random(18);
            int markets = 100;
            for (int r = 0; r < rows; r++) {
                int number = r + 2;
                int serial = 36526 + r / markets;   // 2000-01-01 onwards, one day per block of markets
                xml.write("<row r=\"" + number + "\"><c r=\"A" + number + "\" s=\"1\"><v>" + serial + "</v></c><c r=\"B"
                        + number + "\" t=\"inlineStr\"><is><t>Market " + (r % markets + 1) + "</t></is></c>");
                for (int v = 0; v < values; v++) {
                    xml.write("<c r=\"" + DataProblem.columnLetters(v + 3) + number + "\"><v>"
                            + (1000 + random.nextInt(9_000_000) / 1000.0) + "</v></c>");
                }
                xml.write("</row>");
            }
            xml.write("</sheetData></worksheet>");
            xml.flush();
            zip.closeEntry();
        }
        System.out.printf(Locale.ROOT, "%s: %d rows, %.1f MB written%n", file.getFileName(), rows,
                Files.size(file) / 1048576.0);
    }

    private static void put(ZipOutputStream zip, String name, String text) throws IOException {
        zip.putNextEntry(new ZipEntry(name));
        zip.write(text.getBytes(StandardCharsets.UTF_8));
        zip.closeEntry();
    }
}
