package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.jar.Attributes;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The POSIX launcher {@code src/dist/bin/annalist}, as the distribution lays it out
 * ({@code bin/annalist}, {@code lib/annalist.jar}), run by {@code /bin/sh}. Most cases run it on a
 * stand-in Java (a shell script that prints the arguments it was given, with a {@code release}
 * file naming its version), which shows what the launcher would start without starting a JVM;
 * one starts the real Java on a jar whose manifest points at the test's classpath. Runs where
 * {@code /bin/sh} exists (not on Windows); the test does not need the package phase.
 */
class LauncherScriptTest {

    private static final Path SCRIPT = Path.of("src/dist/bin/annalist");

    @TempDir
    Path temp;

    private Path home;

    @BeforeEach
    void layOutADistribution() throws IOException {
        assumeTrue(Files.isExecutable(Path.of("/bin/sh")), "needs a POSIX shell");
        home = temp.resolve("annalist home");   // a space in the path on purpose
        Files.createDirectories(home.resolve("bin"));
        Files.createDirectories(home.resolve("lib"));
        Files.copy(SCRIPT, home.resolve("bin/annalist"));
        executable(home.resolve("bin/annalist"));
    }

    @Test
    void passesEveryArgumentThroughUnchangedAfterTheJvmSettings() throws Exception {
        Path java = fakeJava("17.0.15");
        Result run = run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(),
                "brief", "my data.csv", "--title", "Nights \"high\" season", "*", "$HOME", "");
        assertThat(run.code).isZero();
        List<String> args = run.lines();
        int main = args.indexOf("org.annalist.cli.Main");
        assertThat(args.subList(main + 1, args.size()))
                .containsExactly("brief", "my data.csv", "--title", "Nights \"high\" season", "*", "$HOME", "");
        assertThat(args.subList(0, main)).contains("-XX:+UseSerialGC", "-Xmx640m", "-Xms64m", "-XX:TieredStopAtLevel=1",
                "-Xshare:auto", "-cp", home.toRealPath().resolve("lib/annalist.jar").toString());
    }

    /**
     * A batch starts its heap above what two briefs at a time make the collector grow it to, all of it
     * touched at the start, so that its peak does not creep up with its length (README, "Start-up and
     * memory": 200 and 1,000 briefs); a heap bound of the user's still replaces these settings.
     */
    @Test
    void aBatchStartsItsHeapLargerThanASingleCommandDoesAndTouchesItAtOnce() throws Exception {
        Path java = fakeJava("17.0.15");
        List<String> batch = run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(),
                "batch", "briefs.yaml").lines();
        assertThat(batch.subList(0, batch.indexOf("org.annalist.cli.Main")))
                .contains("-Xmx640m", "-Xms192m", "-XX:+AlwaysPreTouch").doesNotContain("-Xms64m");
        assertThat(run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(),
                "brief", "f.csv").lines()).contains("-Xms64m").doesNotContain("-XX:+AlwaysPreTouch");
        List<String> own = run(Map.of("JAVA_HOME", java.toString(), "ANNALIST_JAVA_OPTS", "-Xmx2g"), temp,
                home.resolve("bin/annalist").toString(), "batch", "briefs.yaml").lines();
        assertThat(own).contains("-Xmx2g").doesNotContain("-Xmx640m", "-Xms192m", "-XX:+AlwaysPreTouch");
    }

    /**
     * A batch lowers the compile thresholds tenfold, so that its compiled code stops growing within
     * its first hundred or so briefs rather than creeping up with its length (the launcher's comment
     * and the README give the measurement); single commands keep the JVM's thresholds, and a
     * scaling of the user's own replaces ours.
     */
    @Test
    void aBatchCompilesAtATenthOfTheUsualThresholdsUnlessTheUserScalesThem() throws Exception {
        Path java = fakeJava("17.0.15");
        String launcher = home.resolve("bin/annalist").toString();
        List<String> batch = run(Map.of("JAVA_HOME", java.toString()), temp, launcher, "batch", "b.yaml").lines();
        assertThat(batch.subList(0, batch.indexOf("org.annalist.cli.Main")))
                .contains("-XX:CompileThresholdScaling=0.1");
        assertThat(run(Map.of("JAVA_HOME", java.toString()), temp, launcher, "brief", "f.csv").lines())
                .noneMatch(arg -> arg.contains("CompileThresholdScaling"));
        List<String> own = run(Map.of("JAVA_HOME", java.toString(), "ANNALIST_JAVA_OPTS",
                "-XX:CompileThresholdScaling=0.5"), temp, launcher, "batch", "b.yaml").lines();
        assertThat(own).contains("-XX:CompileThresholdScaling=0.5").doesNotContain("-XX:CompileThresholdScaling=0.1");
    }

    /**
     * A batch runs with at most two glibc malloc arenas, so that the native memory of its briefs'
     * layout threads does not spread over more arenas as the batch goes on (the launcher's comment
     * gives the measurement); other commands are left to glibc's default, and a limit of the user's
     * own is kept.
     */
    @Test
    void aBatchLimitsGlibcToTwoMallocArenasUnlessTheUserSetsALimit() throws Exception {
        Path java = fakeJava("17.0.15");
        String launcher = home.resolve("bin/annalist").toString();
        Map<String, String> env = Map.of("JAVA_HOME", java.toString(), "SHOW_MALLOC_ARENA_MAX", "yes");
        assertThat(run(env, temp, launcher, "batch", "b.yaml").lines()).contains("MALLOC_ARENA_MAX=2");
        assertThat(run(env, temp, launcher, "brief", "f.csv").lines()).contains("MALLOC_ARENA_MAX=");
        Map<String, String> own = new HashMap<>(env);
        own.put("MALLOC_ARENA_MAX", "4");
        assertThat(run(own, temp, launcher, "batch", "b.yaml").lines()).contains("MALLOC_ARENA_MAX=4");
    }

    /**
     * Huge pages are asked for where the kernel gives them on request ({@code [madvise]} in its
     * setting), for every command but a batch, whose footprint was sized with small pages; where the
     * kernel gives none, or gives them unasked, they are not asked for (a kernel without them would
     * make the JVM warn). The expectation follows this machine's setting; the user's own setting
     * comes later and wins.
     */
    @Test
    void asksForHugePagesWhereTheKernelGivesThemOnRequestButNotForABatch() throws Exception {
        Path java = fakeJava("17.0.15");
        Path setting = Path.of("/sys/kernel/mm/transparent_hugepage/enabled");
        boolean onRequest = Files.isReadable(setting) && Files.readString(setting).contains("[madvise]");
        String launcher = home.resolve("bin/annalist").toString();
        List<String> check = run(Map.of("JAVA_HOME", java.toString()), temp, launcher, "check", "f.csv").lines();
        List<String> brief = run(Map.of("JAVA_HOME", java.toString()), temp, launcher, "brief", "f.csv").lines();
        List<String> batch = run(Map.of("JAVA_HOME", java.toString()), temp, launcher, "batch", "b.yaml").lines();
        if (onRequest) {
            assertThat(check).contains("-XX:+UseTransparentHugePages");
            assertThat(brief).contains("-XX:+UseTransparentHugePages");
        } else {
            assertThat(check).doesNotContain("-XX:+UseTransparentHugePages");
            assertThat(brief).doesNotContain("-XX:+UseTransparentHugePages");
        }
        assertThat(batch).doesNotContain("-XX:+UseTransparentHugePages");
        List<String> own = run(Map.of("JAVA_HOME", java.toString(), "ANNALIST_JAVA_OPTS", "-XX:-UseTransparentHugePages"),
                temp, launcher, "check", "f.csv").lines();
        assertThat(own.indexOf("-XX:-UseTransparentHugePages")).isGreaterThan(own.indexOf("-XX:+UseTransparentHugePages"));
    }

    @Test
    void findsItsFolderThroughASymbolicLinkFromAnotherWorkingFolder() throws Exception {
        Path java = fakeJava("21.0.2");
        Path linkFolder = Files.createDirectories(temp.resolve("elsewhere/on-path"));
        Path link = Files.createSymbolicLink(linkFolder.resolve("annalist"), home.resolve("bin/annalist"));
        Path workingFolder = Files.createDirectories(temp.resolve("work"));
        Result run = run(Map.of("JAVA_HOME", java.toString()), workingFolder, link.toString(), "--version");
        assertThat(run.code).isZero();
        assertThat(run.lines()).contains(home.toRealPath().resolve("lib/annalist.jar").toString(),
                "-Dannalist.home=" + home.toRealPath());
    }

    @Test
    void userSettingsComeLastAndReplaceTheCollectorAndHeapBound() throws Exception {
        Path java = fakeJava("17.0.1");
        Result run = run(Map.of("JAVA_HOME", java.toString(), "ANNALIST_JAVA_OPTS", "-XX:+UseG1GC -Xmx2g -Dx=1"),
                temp, home.resolve("bin/annalist").toString(), "check", "f.csv");
        List<String> args = run.lines();
        // the starting size goes with the bound: a bound of the user's below it would be refused
        assertThat(args).doesNotContain("-XX:+UseSerialGC", "-Xmx640m", "-Xms64m").contains("-XX:+UseG1GC", "-Xmx2g", "-Dx=1");
        assertThat(args.indexOf("-Dx=1")).isGreaterThan(args.indexOf("-XX:TieredStopAtLevel=1"));
    }

    @Test
    void onJava17To24TheClassDataArchiveMadeForThisFolderAndJavaIsUsed() throws Exception {
        Path java = fakeJava("21.0.2");
        Path lib = home.toRealPath().resolve("lib");
        Files.writeString(lib.resolve("annalist.jsa"), "archive");
        Files.writeString(lib.resolve("annalist.jsa.txt"), home.toRealPath() + "|21.0.2+1\n");
        Result run = run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(), "--version");
        assertThat(run.lines()).contains("-XX:SharedArchiveFile=" + lib.resolve("annalist.jsa"), "-Xshare:auto")
                .noneMatch(a -> a.startsWith("-XX:AOT"));
    }

    /**
     * On Java 17 to 24, where no archive fits, the first brief lists the classes it loads, and the
     * archive is dumped from the list after it (the dumping run's messages never reach the user);
     * the list is removed.
     */
    @Test
    void onJava17AFirstBriefListsTheClassesItLoadsAndLeavesTheArchiveForTheNextRun() throws Exception {
        assertThat(firstBriefLeaving("17.0.15", "annalist.jsa", "archive")).contains("brief", "f.csv")
                .doesNotContain("-Xshare:dump").anyMatch(a -> a.startsWith("-XX:DumpLoadedClassList="));
        assertThat(briefAgain("17.0.15")).contains("-XX:SharedArchiveFile=" + home.toRealPath().resolve("lib/annalist.jsa"))
                .noneMatch(a -> a.startsWith("-XX:DumpLoadedClassList"));
    }

    /** Java 25's ahead-of-time cache replaces the class-data archive; the JVM refuses -Xshare beside it. */
    @Test
    void onJava25AndLaterTheAheadOfTimeCacheMadeForThisFolderAndJavaIsUsedWithoutXshare() throws Exception {
        Path java = fakeJava("25.0.1");
        Path lib = home.toRealPath().resolve("lib");
        Files.writeString(lib.resolve("annalist.aot"), "cache");
        Files.writeString(lib.resolve("annalist.aot.txt"), home.toRealPath() + "|25.0.1+1\n");
        Files.writeString(lib.resolve("annalist.jsa"), "archive");
        Files.writeString(lib.resolve("annalist.jsa.txt"), home.toRealPath() + "|25.0.1+1\n");
        Result run = run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(), "check", "f.csv");
        assertThat(run.code).isZero();
        assertThat(run.lines()).contains("-XX:AOTCache=" + lib.resolve("annalist.aot"), "-XX:TieredStopAtLevel=1")
                .noneMatch(a -> a.startsWith("-Xshare") || a.startsWith("-XX:SharedArchiveFile"));
    }

    @Test
    void onJava25ACacheMadeForAnotherJavaIsPassedOverAndACheckDoesNotMakeOne() throws Exception {
        Path java = fakeJava("25.0.2");
        Path lib = home.toRealPath().resolve("lib");
        Files.writeString(lib.resolve("annalist.aot"), "cache");
        Files.writeString(lib.resolve("annalist.aot.txt"), home.toRealPath() + "|25.0.1+1\n");
        Result run = run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(), "check", "f.csv");
        assertThat(run.lines()).noneMatch(a -> a.startsWith("-XX:AOT"));
        assertThat(Files.readString(lib.resolve("annalist.aot.txt"))).contains("25.0.1+1");
    }

    /**
     * Where no cache fits, the first brief records what it loads and the cache is assembled from the
     * record after it (the assembling run's messages never reach the user); the record is removed.
     */
    @Test
    void onJava25AFirstBriefRecordsWhatItLoadsAndLeavesTheCacheForTheNextRun() throws Exception {
        assertThat(firstBriefLeaving("25.0.1", "annalist.aot", "cache"))
                .contains("-XX:AOTMode=record", "-XX:-DisplayVMOutput", "brief", "f.csv").doesNotContain("-XX:AOTMode=create");
        assertThat(briefAgain("25.0.1")).contains("-XX:AOTCache=" + home.toRealPath().resolve("lib/annalist.aot"))
                .doesNotContain("-XX:AOTMode=record");
    }

    /**
     * A first brief on a stand-in Java of {@code version}, which must leave in lib/ exactly
     * {@code archive} (holding what the stand-in wrote, {@code content}) and its .txt naming this
     * folder and Java; returns the arguments the launcher gave Java.
     */
    private List<String> firstBriefLeaving(String version, String archive, String content) throws Exception {
        Path lib = home.toRealPath().resolve("lib");
        Result run = run(Map.of("JAVA_HOME", fakeJava(version).toString()), temp, home.resolve("bin/annalist").toString(),
                "brief", "f.csv");
        assertThat(run.code).isZero();
        assertThat(Files.readString(lib.resolve(archive))).isEqualTo(content);
        assertThat(Files.readString(lib.resolve(archive + ".txt"))).isEqualTo(home.toRealPath() + "|" + version + "+1\n");
        try (var left = Files.list(lib)) {
            assertThat(left.map(p -> p.getFileName().toString())).containsExactlyInAnyOrder(archive, archive + ".txt");
        }
        return run.lines();
    }

    /** The arguments of a brief on the stand-in Java of {@code version} made before. */
    private List<String> briefAgain(String version) throws Exception {
        return run(Map.of("JAVA_HOME", temp.resolve("jdk " + version).toString()), temp,
                home.resolve("bin/annalist").toString(), "brief", "f.csv").lines();
    }

    /** Java 17's class-data archive and Java 25's cache alike: a first brief that fails makes neither. */
    @Test
    void aFailingFirstBriefKeepsItsExitCodeAndLeavesNoArchiveOrCache() throws Exception {
        Path lib = home.toRealPath().resolve("lib");
        for (String version : List.of("17.0.15", "25.0.1")) {
            Path java = fakeJava(version);
            Result run = run(Map.of("JAVA_HOME", java.toString(), "FAKE_EXIT", "2"), temp,
                    home.resolve("bin/annalist").toString(), "brief", "missing.csv");
            assertThat(run.code).as(version).isEqualTo(2);
            try (var left = Files.list(lib)) {
                assertThat(left).as(version).isEmpty();
            }
        }
    }

    @Test
    void classDataSettingsOfTheUsersOwnReplaceTheCacheOnJava25() throws Exception {
        Path java = fakeJava("25.0.1");
        Path lib = home.toRealPath().resolve("lib");
        Files.writeString(lib.resolve("annalist.aot"), "cache");
        Files.writeString(lib.resolve("annalist.aot.txt"), home.toRealPath() + "|25.0.1+1\n");
        Result run = run(Map.of("JAVA_HOME", java.toString(), "ANNALIST_JAVA_OPTS", "-Xshare:off"), temp,
                home.resolve("bin/annalist").toString(), "brief", "f.csv");
        assertThat(run.lines()).contains("-Xshare:off").noneMatch(a -> a.startsWith("-XX:AOT"));
    }

    @Test
    void refusesAJavaOlderThan17SayingWhatToInstallWithExitCode2() throws Exception {
        Path java = fakeJava("11.0.21");
        Result run = run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(), "--help");
        assertThat(run.code).isEqualTo(2);
        assertThat(run.stdout).isEmpty();
        assertThat(run.stderr).contains("needs Java 17 or later").contains("11.0.21").contains("install a Java 17");
    }

    @Test
    void refusesAJavaHomeWithoutJavaWithExitCode2() throws Exception {
        Path empty = Files.createDirectories(temp.resolve("no java here"));
        Result run = run(Map.of("JAVA_HOME", empty.toString()), temp, home.resolve("bin/annalist").toString(), "--help");
        assertThat(run.code).isEqualTo(2);
        assertThat(run.stderr).contains("JAVA_HOME is set to '" + empty + "', which holds no bin/java")
                .contains("install a Java 17");
    }

    @Test
    void saysWhatToInstallWhenThereIsNoJavaAtAllWithExitCode2() throws Exception {
        // an empty PATH folder: the script needs no outside program to find that there is no Java
        Path tools = Files.createDirectories(temp.resolve("tools"));
        Result run = run(Map.of("PATH", tools.toString()), temp, home.resolve("bin/annalist").toString(), "--help");
        assertThat(run.code).isEqualTo(2);
        assertThat(run.stderr).contains("no Java found").contains("install a Java 17");
    }

    @Test
    void startsTheRealJavaOnTheTool() throws Exception {
        Path java = Path.of(System.getProperty("java.home"));
        assumeTrue(Files.isReadable(java.resolve("release")), "the running Java has no release file");
        manifestOnlyJar(home.resolve("lib/annalist.jar"));
        Result run = run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(), "--version");
        assertThat(run.code).as(run.stderr).isZero();
        assertThat(run.stdout).startsWith("annalist ");
        assertThat(run.stderr).isEmpty();
    }

    /**
     * A brief through the launcher writes its PDF and says nothing on standard error: no library's
     * log lines reach the user (with SLF4J on the class path for the workbench's server, PDFBox's
     * logging goes through it and once announced its font substitutions on every brief).
     */
    @Test
    void aBriefThroughTheLauncherSaysNothingOnStandardError() throws Exception {
        Path java = Path.of(System.getProperty("java.home"));
        assumeTrue(Files.isReadable(java.resolve("release")), "the running Java has no release file");
        manifestOnlyJar(home.resolve("lib/annalist.jar"));
        Path data = Path.of("src/test/resources/reference/AirPassengers.csv").toAbsolutePath();
        Path pdf = temp.resolve("air.pdf");
        Result run = run(Map.of("JAVA_HOME", java.toString()), temp, home.resolve("bin/annalist").toString(), "brief",
                data.toString(), "-o", pdf.toString(), "--generated-at", "2026-11-20T08:00:00Z");
        assertThat(run.code).as(run.stderr).isZero();
        assertThat(pdf).isRegularFile();
        assertThat(run.stderr).isEmpty();
    }

    /**
     * A JDK folder whose bin/java prints its arguments one per line (after the glibc arena limit it
     * was started with, when {@code SHOW_MALLOC_ARENA_MAX} is set) and exits with {@code FAKE_EXIT}
     * (0 without it), and whose release file names {@code version}.
     */
    private Path fakeJava(String version) throws IOException {
        Path jdk = Files.createDirectories(temp.resolve("jdk " + version));
        Files.createDirectories(jdk.resolve("bin"));
        Files.writeString(jdk.resolve("release"), "IMPLEMENTOR=\"test\"\nJAVA_RUNTIME_VERSION=\"" + version
                + "+1\"\nJAVA_VERSION=\"" + version + "\"\n");
        Path java = jdk.resolve("bin/java");
        // as Java 25 does: a record run writes its configuration, a create run the cache
        Files.writeString(java, """
                #!/bin/sh
                mode=; conf=; cache=; list=; archive=; dump=
                if [ -n "${SHOW_MALLOC_ARENA_MAX:-}" ]; then printf 'MALLOC_ARENA_MAX=%s\n' "${MALLOC_ARENA_MAX-}"; fi
                for a in "$@"; do
                    printf '%s\\n' "$a"
                    case $a in
                        -XX:AOTMode=*) mode=${a#*=} ;;
                        -XX:AOTConfiguration=*) conf=${a#*=} ;;
                        -XX:AOTCache=*) cache=${a#*=} ;;
                        -XX:DumpLoadedClassList=*) list=${a#*=} ;;
                        -XX:SharedArchiveFile=*) archive=${a#*=} ;;
                        -Xshare:dump) dump=yes ;;
                    esac
                done
                if [ "$mode" = record ]; then printf 'record' > "$conf"; fi
                if [ "$mode" = create ]; then printf 'cache' > "$cache"; fi
                if [ -n "$list" ]; then printf 'list' > "$list"; fi
                if [ "$dump" = yes ]; then printf 'archive' > "$archive"; fi
                exit ${FAKE_EXIT:-0}
                """);
        executable(java);
        return jdk;
    }

    /** A jar of nothing but a manifest whose Class-Path is this test's classpath: the tool as the test sees it. */
    private static void manifestOnlyJar(Path jar) throws IOException {
        Manifest manifest = new Manifest();
        manifest.getMainAttributes().put(Attributes.Name.MANIFEST_VERSION, "1.0");
        List<String> urls = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            urls.add(Path.of(entry).toAbsolutePath().toUri().toString());
        }
        manifest.getMainAttributes().put(Attributes.Name.CLASS_PATH, String.join(" ", urls));
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar), manifest)) {
            out.flush();
        }
    }

    private static void executable(Path file) throws IOException {
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rwxr-xr-x"));
    }

    private record Result(int code, String stdout, String stderr) {
        List<String> lines() {
            return stdout.lines().toList();
        }
    }

    private static final int LAUNCHER_LIMIT_SECONDS = 400;

    private static Result run(Map<String, String> env, Path workingFolder, String... command) throws Exception {
        ProcessBuilder builder = new ProcessBuilder(command).directory(workingFolder.toFile());
        builder.environment().remove("JAVA_HOME");
        builder.environment().remove("ANNALIST_JAVA_OPTS");
        builder.environment().remove("MALLOC_ARENA_MAX");
        builder.environment().putAll(env);
        Path out = Files.createTempFile("launcher", ".out");
        Path err = Files.createTempFile("launcher", ".err");
        Process process = builder.redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        // a guard against a hung launcher, not a speed check: the first brief also writes the class-data
        // archive, which took over 120 s once on a machine shared by several builds (load average 19)
        if (!process.waitFor(LAUNCHER_LIMIT_SECONDS, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new AssertionError("the launcher did not finish within " + LAUNCHER_LIMIT_SECONDS + " s: "
                    + List.of(command));
        }
        Result result = new Result(process.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
        Files.delete(out);
        Files.delete(err);
        return result;
    }
}
