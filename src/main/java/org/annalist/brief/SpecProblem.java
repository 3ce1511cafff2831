package org.annalist.brief;

import java.nio.file.Path;

/** A brief spec that cannot be used, with the place in it: {@code SPEC:LINE:COLUMN: message}. */
public final class SpecProblem extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public SpecProblem(Path spec, int line, int column, String message) {
        super(spec + ":" + line + ":" + column + ": " + message);
    }
}
