package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Property: whatever a data file, a brief spec or a template folder holds — the demo and reference
 * files edited by {@link HostileMutations} (lines deleted, doubled, swapped; bytes flipped; delimiters,
 * quotes, NULs, huge numbers, byte order marks, mixed line ends; empty files, binary junk; specs with
 * unknown keys, wrong types, paths leading out of their folder, aliases, huge lists; templates with
 * unclosed directives, unknown variables, endless lists, images, fonts and includes outside their
 * folder, a template that is a link leading out) —
 * the real command line, run in-process through {@link Main#run}:
 * <ul>
 * <li>ends with exit 0 or 2 ({@code batch} also 3, when some of its briefs fail), never 1;</li>
 * <li>prints no stack trace and no exception or error class name;</li>
 * <li>names a file in every line it writes to the error stream;</li>
 * <li>changes no file outside the case's output folder (the output folder is a fresh temporary
 *     folder; for a {@code batch} run without {@code --out}, the spec's own folder, where its outputs
 *     go, and even there no file that was there before): the whole tree of the case is compared
 *     before and after, and the working folder and the temporary folder are searched for strays;</li>
 * <li>holds at most {@link #HEAP_BOUND_BYTES} of heap (measured as said there) and takes at most
 *     {@link #TIME_BOUND_MILLIS}.</li>
 * </ul>
 *
 * <p>Cases are drawn from a fixed seed, so a run is reproducible; the default 36 cases take about a
 * minute on two busy cores. For a longer hunt, set the seed and the number of cases (system
 * properties, passed on by Maven):
 * {@code mvn -B -o test -Dtest=HostileInputPropertyTest -Dannalist.hostile.seed=7 -Dannalist.hostile.cases=500};
 * {@code -Dannalist.hostile.verbose=true} prints each case's edits, exit code, heap and first error
 * line and time; {@code -Dannalist.hostile.keep=true} copies each case's files to
 * {@code java.io.tmpdir/annalist-hostile-SEED}. Case {@code c} of seed {@code S} is case 0 of seed
 * {@code S + c}, so a failure (its message gives the seed) is replayed alone.
 */
class HostileInputPropertyTest {

    static final long SEED = Long.getLong("annalist.hostile.seed", 20261203L);
    static final int CASES = Integer.getInteger("annalist.hostile.cases", 36);
    /**
     * The heap a case may hold: the sum of the peaks, over the case, of the heap's pools other than
     * the young generation's eden (so what outlived a young collection, and every large array, which
     * the collector places in the old pool directly), after a full collection before the case. A
     * brief of these files holds under 200 MB (the most seen: 192 MB, a template writing 8 MB of
     * XHTML); an input read into memory without limit, as {@code /dev/zero} once was, holds
     * gigabytes. The bound is from the runs of this test (no source).
     */
    static final long HEAP_BOUND_BYTES = 512L << 20;

    /**
     * The time a case may take: a brief of these files takes seconds, and the limits a template or the
     * layout may run to are 10 s and 120 s; a mistyped year once made a brief of four centuries that
     * took minutes. Our bound (no source).
     */
    static final long TIME_BOUND_MILLIS = 120_000;

    private static final List<Path> SOURCES = List.of(Path.of("demo-data/quennelmark-guest-nights.csv"),
            Path.of("demo-data/quennelmark-arrivals.csv"), Path.of("demo-data/glassworks-daily-visitors.csv"),
            Path.of("src/test/resources/reference/AirPassengers.csv"), Path.of("src/test/resources/reference/Nile.csv"),
            Path.of("src/test/resources/reference/UKgas.csv"), Path.of("src/test/resources/reference/co2.csv"),
            Path.of("src/test/resources/reference/nottem.csv"), Path.of("src/test/resources/reference/sunspot.year.csv"));
    /** Small sources, for the cases that make briefs (a daily file's brief takes several seconds). */
    private static final List<Path> SMALL = List.of(SOURCES.get(0), SOURCES.get(3), SOURCES.get(4), SOURCES.get(5), SOURCES.get(7));
    private static final Pattern CLASS_NAME = Pattern.compile("\\b[A-Z][A-Za-z]*(Exception|Error)\\b|\\bat [a-z]+\\.[a-z.]+[A-Z]");
    /** Names the cases use for what may not be written; searched for in the working and temporary folders. */
    private static final Pattern STRAY = Pattern.compile("(escaped-.*|brief-.*\\.pdf|.*\\.pdf)");

    @TempDir
    Path root;

    enum Kind { READ, BRIEF, BATCH, TEMPLATE }

    @Test
    void hostileFilesEndInExitZeroOrTwoWithFilesNamedNothingWrittenOutsideAndBoundedHeap() throws IOException {
        Set<String> workingBefore = names(Path.of(""));
        Set<String> tempBefore = names(root.getParent());
        long worstHeap = 0;
        Map<Kind, int[]> exits = new TreeMap<>();
        List<String> failures = new ArrayList<>();
        for (int c = 0; c < CASES; c++) {
            try {
                Outcome outcome = runCase(c);
                worstHeap = Math.max(worstHeap, outcome.heap);
                exits.computeIfAbsent(outcome.kind, k -> new int[4])[outcome.exit]++;
            } catch (AssertionError failed) {
                failures.add(failed.getMessage());
            }
        }
        Set<String> workingNew = new HashSet<>(names(Path.of("")));
        workingNew.removeAll(workingBefore);
        assertThat(workingNew).as("new files in the working folder").noneMatch(n -> STRAY.matcher(n).matches());
        Set<String> tempNew = new HashSet<>(names(root.getParent()));
        tempNew.removeAll(tempBefore);
        assertThat(tempNew).as("new files in the temporary folder").noneMatch(n -> n.startsWith("escaped-"));
        StringBuilder summary = new StringBuilder("hostile inputs, seed " + SEED + ", " + CASES + " cases; exits by kind (0/1/2/3):");
        exits.forEach((k, e) -> summary.append(' ').append(k).append(' ').append(e[0]).append('/').append(e[1]).append('/')
                .append(e[2]).append('/').append(e[3]));
        System.out.println(summary.append("; worst heap ").append(worstHeap >> 20).append(" MB"));
        assertThat(failures).as(failures.size() + " of " + CASES + " cases failed").isEmpty();
    }

    private record Outcome(Kind kind, int exit, long heap) {
    }

    private Outcome runCase(int c) throws IOException {
        long seed = SEED + c;
        Random random = new Random(seed);
        Kind kind = Kind.values()[(int) Math.floorMod(seed, (long) Kind.values().length)];
        Path dir = Files.createDirectories(root.resolve("case-" + c));
        Path in = Files.createDirectories(dir.resolve("in"));
        Path out = Files.createDirectories(dir.resolve("out"));
        Files.writeString(in.resolve("outside.csv"), "period,value\n2024-01,1\n2024-02,2\n");
        List<String> applied = new ArrayList<>();
        List<String> args = new ArrayList<>();
        Path allowed = out;
        switch (kind) {
            case READ -> {
                Path data = Files.write(in.resolve("data.csv"), HostileMutations.csv(source(SOURCES, random), random, applied));
                args.addAll(switch (random.nextInt(3)) {
                    case 0 -> List.of("check", data.toString());
                    case 1 -> List.of("analyze", data.toString());
                    default -> List.of("analyze", data.toString(), "--format", "json");
                });
            }
            case BRIEF -> {
                Path source = SMALL.get(random.nextInt(SMALL.size()));
                Path data = Files.write(in.resolve("data.csv"), HostileMutations.csv(Files.readAllBytes(source), random, applied));
                args.addAll(List.of("brief", data.toString(), "-o", out.resolve("brief.pdf").toString(),
                        "--generated-at", "2026-11-20T08:00:00Z"));
                if (source.equals(SOURCES.get(0))) {
                    args.addAll(List.of("--series", "Total"));
                }
                if (random.nextInt(3) > 0) {
                    args.addAll(List.of("--horizon", "0"));
                }
            }
            case BATCH -> {
                Path folder = Files.createDirectories(in.resolve("spec"));
                Files.createSymbolicLink(folder.resolve("link"), in);
                byte[] good = source(SMALL, random);
                Files.write(folder.resolve("data.csv"), random.nextBoolean() ? good : HostileMutations.csv(good, random, applied));
                Path spec = Files.writeString(folder.resolve("briefs.yaml"), HostileMutations.spec("data.csv", random, applied));
                args.addAll(List.of("batch", spec.toString(), "--jobs", "2"));
                if (random.nextBoolean()) {
                    args.addAll(List.of("--out", out.toString()));
                } else {
                    allowed = folder;
                }
            }
            case TEMPLATE -> {
                Path templates = Files.createDirectories(in.resolve("templates"));
                Files.copy(Path.of("src/main/resources/org/annalist/render/fonts/DejaVuSans.ttf"), in.resolve("outside.ttf"));
                for (String name : List.of("brief.ftlx", "brief.css", "multi.ftlx")) {
                    Files.copy(Path.of("report-templates", name), templates.resolve(name));
                }
                int which = random.nextInt(8);
                if (which == 0) {
                    // a template that is a link leading out of its folder, or nowhere
                    Path ftlx = templates.resolve("brief.ftlx");
                    Files.delete(ftlx);
                    Files.createSymbolicLink(ftlx, random.nextBoolean() ? in.resolve("outside.csv") : in.resolve("gone.ftlx"));
                    applied.add("brief.ftlx a link out of the folder");
                } else if (which <= 2) {
                    Path css = templates.resolve("brief.css");
                    Files.writeString(css, HostileMutations.css(Files.readString(css), random, applied));
                } else {
                    Path ftlx = templates.resolve("brief.ftlx");
                    Files.writeString(ftlx, HostileMutations.template(Files.readString(ftlx), random, applied));
                }
                Path source = SMALL.get(random.nextInt(SMALL.size()));
                Path data = Files.write(in.resolve("data.csv"), Files.readAllBytes(source));
                args.addAll(List.of("brief", data.toString(), "-o", out.resolve("brief.pdf").toString(), "--templates",
                        templates.toString(), "--horizon", "0", "--generated-at", "2026-11-20T08:00:00Z"));
                if (source.equals(SOURCES.get(0))) {
                    args.addAll(List.of("--series", "Total"));
                }
            }
        }
        Map<Path, String> before = tree(dir);
        List<MemoryPoolMXBean> heapPools = ManagementFactory.getMemoryPoolMXBeans().stream()
                .filter(p -> p.getType() == MemoryType.HEAP && !p.getName().contains("Eden")).toList();
        System.gc();
        heapPools.forEach(MemoryPoolMXBean::resetPeakUsage);
        if (Boolean.getBoolean("annalist.hostile.keep")) {
            // for a failure's replay: the case's files stay where they can be looked at
            Path kept = Path.of(System.getProperty("java.io.tmpdir"), "annalist-hostile-" + seed);
            try (Stream<Path> walk = Files.walk(dir)) {
                for (Path p : walk.filter(Files::isRegularFile).toList()) {
                    Path copy = kept.resolve(dir.relativize(p).toString());
                    Files.createDirectories(copy.getParent());
                    Files.copy(p, copy, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                }
            }
            System.out.println("case files kept in " + kept + "; command: " + String.join(" ", args));
        }
        long started = System.nanoTime();
        Run run = Run.of(args.toArray(String[]::new));
        long millis = (System.nanoTime() - started) / 1_000_000;
        long heap = heapPools.stream().mapToLong(p -> p.getPeakUsage().getUsed()).sum();
        Map<Path, String> after = tree(dir);

        String label = "case " + c + " (replay: -Dannalist.hostile.seed=" + seed + " -Dannalist.hostile.cases=1), " + kind
                + " " + applied + ", command " + String.join(" ", args).replace(dir.toString(), "CASE") + "\nerr: "
                + run.err() + "\nout: " + tail(run.out());
        if (Boolean.getBoolean("annalist.hostile.verbose")) {
            System.out.println("case " + c + " " + kind + " exit " + run.exitCode() + " heap " + (heap >> 20) + " MB " + millis + " ms "
                    + applied + " " + run.err().lines().findFirst().orElse(""));
        }
        assertThat(run.exitCode()).as(label).isIn(kind == Kind.BATCH ? List.of(0, 2, 3) : List.of(0, 2));
        assertThat(run.out() + run.err()).as(label).doesNotContain("\tat ").doesNotContainPattern(CLASS_NAME);
        Set<String> names = names(dir, after.keySet());
        for (String line : run.err().lines().filter(l -> !l.isBlank()).toList()) {
            assertThat(names).as(label + "\nthe line names no file: " + line).anyMatch(line::contains);
        }
        for (Map.Entry<Path, String> file : before.entrySet()) {
            assertThat(after.get(file.getKey())).as(label + "\n" + file.getKey() + " changed").isEqualTo(file.getValue());
        }
        for (Path file : after.keySet()) {
            if (!before.containsKey(file)) {
                assertThat(file.startsWith(allowed)).as(label + "\nwritten outside the output folder: " + file).isTrue();
            }
        }
        assertThat(heap).as(label + "\nheap used, bytes").isLessThanOrEqualTo(HEAP_BOUND_BYTES);
        assertThat(millis).as(label + "\ntime taken, ms").isLessThanOrEqualTo(TIME_BOUND_MILLIS);
        return new Outcome(kind, run.exitCode(), heap);
    }

    private static byte[] source(List<Path> sources, Random random) throws IOException {
        return Files.readAllBytes(sources.get(random.nextInt(sources.size())));
    }

    /** Every file and folder under {@code dir} (links not followed) with a digest of its content. */
    private static Map<Path, String> tree(Path dir) throws IOException {
        Map<Path, String> files = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.toList()) {
                files.put(p, Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS) ? digest(Files.readAllBytes(p))
                        : Files.isSymbolicLink(p) ? "link " + Files.readSymbolicLink(p) : "folder");
            }
        }
        return files;
    }

    /** What an error line may name: the case's folder, any file in it, the files the edits refer to. */
    private static Set<String> names(Path dir, Set<Path> files) {
        Set<String> names = new HashSet<>(Set.of(dir.toString(), "/dev/zero", "/etc/passwd", "127.0.0.1", "brief.ftlx", "brief.css"));
        files.stream().map(Path::getFileName).filter(n -> n != null && n.toString().length() > 3).forEach(n -> names.add(n.toString()));
        return names;
    }

    private static Set<String> names(Path folder) throws IOException {
        try (Stream<Path> list = Files.list(folder.toAbsolutePath())) {
            return new HashSet<>(list.map(p -> p.getFileName().toString()).toList());
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    private static String digest(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static String tail(String s) {
        return s.length() <= 2000 ? s : "…" + s.substring(s.length() - 2000);
    }
}
