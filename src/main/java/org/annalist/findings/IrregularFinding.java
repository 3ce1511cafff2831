package org.annalist.findings;

/**
 * The findings JSON {@code irregular} block.
 *
 * @param share share of the variation around the long-run trend that is irregular (0–1)
 * @param label {@code small}, {@code moderate} or {@code large}
 */
public record IrregularFinding(Double share, String label) {
}
