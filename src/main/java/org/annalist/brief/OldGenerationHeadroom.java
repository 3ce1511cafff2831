package org.annalist.brief;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryUsage;
import java.util.List;
import java.util.Optional;

/**
 * Keeps a batch's heap from growing with the number of briefs under the serial collector (the
 * launcher's): between two briefs, once the old generation is {@value #FULL_ENOUGH} full, a full
 * collection is asked for then, instead of letting a young collection find the old generation full.
 *
 * <p>Why: when the survivors of a young collection no longer fit into the old generation, the serial
 * collector grows the old generation by what did not fit (into the heap's unused reserve, up to
 * {@code -Xmx}), collects it in full and then gives the growth back. 79 of the 89 full
 * collections of a batch of 200 and one of 1,000 briefs came that way (GC logs, 4 December 2026,
 * growths of 1 to 6 MB). The pages of each growth are touched before they are given back, and so
 * is the whole old generation, filled to its last page before each such collection; the largest
 * growth of a run lands in its peak resident memory, and a longer batch draws more of them. Asked
 * for in time (batches of 200 and 1,000 briefs: every full collection so, none after a growth), the
 * collection finds the old generation with room to spare and no growth is needed. The check is one
 * read of the pool's usage, once a brief; under another collector (chosen through
 * {@code ANNALIST_JAVA_OPTS}) it does nothing, as it does when explicit collections are disabled.
 */
final class OldGenerationHeadroom {

    /** The share of the old generation's committed size in use that brings a full collection. */
    static final double FULL_ENOUGH = 0.80;

    /** The serial collector's name for its old generation's pool. */
    static final String SERIAL_OLD_GENERATION = "Tenured Gen";

    private final Optional<MemoryPoolMXBean> oldGeneration;

    private OldGenerationHeadroom(Optional<MemoryPoolMXBean> oldGeneration) {
        this.oldGeneration = oldGeneration;
    }

    /** The watch of this JVM's old generation; inert unless the JVM runs the serial collector. */
    static OldGenerationHeadroom ofThisJvm() {
        return new OldGenerationHeadroom(serialOldGeneration(ManagementFactory.getMemoryPoolMXBeans()));
    }

    static Optional<MemoryPoolMXBean> serialOldGeneration(List<MemoryPoolMXBean> pools) {
        return pools.stream().filter(pool -> SERIAL_OLD_GENERATION.equals(pool.getName())).findFirst();
    }

    /** Call after each brief: collects in full when the old generation has too little room left. */
    synchronized void afterBrief() {
        if (oldGeneration.isPresent()) {
            MemoryUsage usage = oldGeneration.get().getUsage();
            if (tooFull(usage.getUsed(), usage.getCommitted())) {
                System.gc();
            }
        }
    }

    /** Whether an old generation of {@code committed} bytes with {@code used} bytes in use should be collected now. */
    static boolean tooFull(long used, long committed) {
        return committed > 0 && used >= FULL_ENOUGH * committed;
    }
}
