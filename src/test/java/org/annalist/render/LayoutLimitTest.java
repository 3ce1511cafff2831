package org.annalist.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A layout that runs past its time limit is stopped and reported, not waited for. */
class LayoutLimitTest {

    private static final String XHTML = "<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\"><head><title>T</title></head><body>"
            + "<p>words and more words</p>".repeat(20_000) + "</body></html>";

    @Test
    void aLayoutPastItsLimitIsAMistakeWithTheLimitNamed() {
        long start = System.nanoTime();
        assertThatThrownBy(() -> new PdfRenderer(Duration.ofMillis(200)).render(XHTML, Sandbox.closed(Path.of(".")), List.of(),
                Instant.EPOCH, 1L))
                .isInstanceOf(TemplateMistakeException.class)
                .hasMessageStartingWith("the PDF layout did not finish within 200 ms (" + XHTML.length() + " characters of XHTML");
        assertThat(Duration.ofNanos(System.nanoTime() - start)).isLessThan(Duration.ofSeconds(5));
    }
}
