package org.annalist.findings;

import java.util.List;

/**
 * Where the data came from, as the brief's data appendix states it.
 *
 * @param reading how the file was read, e.g. {@code UTF-8, comma-separated, wide layout, periods written YYYY-MM}
 * @param notes   the reader's warnings, each with file and line
 */
public record SourceFacts(String file, String sha256, int rowsRead, String reading, List<String> notes) {

    public SourceFacts {
        notes = List.copyOf(notes);
    }
}
