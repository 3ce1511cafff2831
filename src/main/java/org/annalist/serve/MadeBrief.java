package org.annalist.serve;

import java.nio.file.Path;
import java.util.List;

/**
 * A brief made in the browser: its folder in the session, the PDF and the files written beside it
 * (the only names its downloads accept), and how many pages the PDF has.
 */
public record MadeBrief(String id, String fileId, int series, String title, Path folder, String pdf, List<String> files,
                 int pages, List<String> warnings) {
    public MadeBrief {
        files = List.copyOf(files);
        warnings = List.copyOf(warnings);
    }
}
