package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryUsage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * {@link OldGenerationHeadroom} collects in full between briefs once the serial collector's old
 * generation is 80 % full, and not before; under another collector it does nothing. The collector is
 * the JVM's choice at start, so the serial cases run in a JVM of their own started here.
 */
class OldGenerationHeadroomTest {

    @Test
    void anOldGenerationIsTooFullFromFourFifthsOfItsCommittedSize() {
        // 80 of 100 bytes is the threshold itself (derived in the test from FULL_ENOUGH = 0.80)
        assertThat(OldGenerationHeadroom.tooFull(80, 100)).isTrue();
        assertThat(OldGenerationHeadroom.tooFull(79, 100)).isFalse();
        assertThat(OldGenerationHeadroom.tooFull(0, 0)).isFalse();
    }

    @Test
    void underTheSerialCollectorAFullOldGenerationIsCollectedAndARoomyOneIsNot() throws Exception {
        assertThat(inSerialJvm("full")).isEqualTo("collected 1");
        assertThat(inSerialJvm("roomy")).isEqualTo("collected 0");
    }

    @Test
    void underAnotherCollectorThereIsNothingToWatch() throws Exception {
        assertThat(inJvm("-XX:+UseParallelGC", "pools")).isEqualTo("serial old generation: false");
        assertThat(inSerialJvm("pools")).isEqualTo("serial old generation: true");
    }

    private static String inSerialJvm(String scenario) throws IOException, InterruptedException {
        return inJvm("-XX:+UseSerialGC", scenario);
    }

    private static String inJvm(String collector, String scenario) throws IOException, InterruptedException {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process process = new ProcessBuilder(java.toString(), collector, "-Xms64m", "-Xmx256m", "-Xshare:off",
                "-cp", System.getProperty("java.class.path"), Scenario.class.getName(), scenario)
                .redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertThat(process.waitFor(60, TimeUnit.SECONDS)).isTrue();
        assertThat(process.exitValue()).as(output).isZero();
        return output;
    }

    /** Run in a JVM of its own: fills the old generation (or not), then asks the watch once. */
    static final class Scenario {
        public static void main(String[] args) {
            switch (args[0]) {
                case "pools" -> System.out.println("serial old generation: "
                        + OldGenerationHeadroom.serialOldGeneration(ManagementFactory.getMemoryPoolMXBeans()).isPresent());
                case "full" -> {
                    fillOldGeneration();
                    System.out.println("collected " + fullCollectionsDuring());
                }
                case "roomy" -> {
                    System.gc();   // what was in the old generation is gone: far below four fifths
                    System.out.println("collected " + fullCollectionsDuring());
                }
                default -> throw new IllegalArgumentException(args[0]);
            }
        }

        /** Promotes garbage of 1 MB arrays into the old generation until it is four fifths full. */
        private static void fillOldGeneration() {
            MemoryPoolMXBean old = OldGenerationHeadroom.serialOldGeneration(ManagementFactory.getMemoryPoolMXBeans())
                    .orElseThrow();
            List<byte[]> kept = new ArrayList<>();
            for (int megabytes = 0; megabytes < 100_000; megabytes++) {
                MemoryUsage usage = old.getUsage();
                if (OldGenerationHeadroom.tooFull(usage.getUsed(), usage.getCommitted())) {
                    return;
                }
                kept.add(new byte[1 << 20]);
                if (kept.size() == 4) {
                    kept.clear();   // dropped after having survived young collections into the old generation
                }
            }
            throw new IllegalStateException("the old generation never came to four fifths full");
        }

        private static long fullCollectionsDuring() {
            long before = fullCollections();
            OldGenerationHeadroom.ofThisJvm().afterBrief();
            return fullCollections() - before;
        }

        private static long fullCollections() {
            return ManagementFactory.getGarbageCollectorMXBeans().stream().filter(gc -> gc.getName().equals("MarkSweepCompact"))
                    .mapToLong(GarbageCollectorMXBean::getCollectionCount).sum();
        }
    }
}
