package org.annalist.serve;

import java.nio.file.Path;
import org.annalist.brief.Job;
import org.annalist.brief.SeriesFiles;

/**
 * A data file a browser opened: where it is kept in the session's folder, the name the user gave
 * it, and the file as read (once; every later view of its series re-analyses what was read).
 */
record OpenFile(String id, String name, Path stored, Job.Input input, SeriesFiles.ReadFile read) {
}
