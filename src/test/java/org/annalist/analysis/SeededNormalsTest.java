package org.annalist.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/** The reference is the JDK itself: {@code java.util.Random} specifies the same algorithm. */
class SeededNormalsTest {

    @Property(tries = 50)
    void drawsAreExactlyThoseOfJavaUtilRandomWithTheSameSeed(@ForAll long seed) {
        Random reference = new Random(seed);
        SeededNormals draws = new SeededNormals(seed);
        for (int i = 0; i < 10_001; i++) {
            assertThat(draws.next()).isEqualTo(reference.nextGaussian());
        }
    }
}
