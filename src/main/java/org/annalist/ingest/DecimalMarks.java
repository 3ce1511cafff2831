package org.annalist.ingest;

import java.util.Optional;

/**
 * The decimal mark of a file, decided as its value cells go by: as set, or as the first number that
 * proves one ({@code 12.5}, {@code 12,5}); a file whose numbers prove both is refused. When no number
 * proves a mark, an ambiguous {@code 1,234} reads as thousands, with a warning.
 *
 * <p>Until a mark is proved, a cell that reads differently by the mark ({@code 1,234}, {@code 1.234})
 * is read both ways ({@link Reading#pending}); the reader keeps the other reading and takes it if the
 * mark, once decided, is not the one it read with.
 */
final class DecimalMarks {

    /** How to read one cell: with {@code mark}; {@code pending} when the other mark's reading must be kept too. */
    record Reading(DecimalMark mark, boolean pending, boolean conflicting) {

        /** One of the few readings there are (a cell of a big file makes none). */
        static Reading of(DecimalMark mark, boolean pending, boolean conflicting) {
            return ALL[mark.ordinal() * 4 + (pending ? 2 : 0) + (conflicting ? 1 : 0)];
        }
    }

    private static final Reading[] ALL = new Reading[DecimalMark.values().length * 4];

    static {
        for (DecimalMark mark : DecimalMark.values()) {
            for (int i = 0; i < 4; i++) {
                ALL[mark.ordinal() * 4 + i] = new Reading(mark, (i & 2) != 0, (i & 1) != 0);
            }
        }
    }

    private final Optional<DecimalMark> requested;
    private final int[] firstLine = new int[DecimalMark.values().length];
    private DecimalMark proved;
    private int ambiguousLine;
    private String ambiguousCell;

    DecimalMarks(Optional<DecimalMark> requested) {
        this.requested = requested;
    }

    /** Notes what {@code cell} on {@code line} proves, and says how to read it. */
    Reading see(String cell, int line) {
        if (requested.isPresent()) {
            return Reading.of(requested.get(), false, false);
        }
        switch (NumberCells.evidence(cell)) {
            case POINT -> {
                firstLine[0] = firstLine[0] == 0 ? line : firstLine[0];
                return prove(DecimalMark.POINT);
            }
            case COMMA -> {
                firstLine[1] = firstLine[1] == 0 ? line : firstLine[1];
                return prove(DecimalMark.COMMA);
            }
            default -> {
                boolean dependsOnMark = (cell.indexOf(',') >= 0 || cell.indexOf('.') >= 0) && NumberCells.looksNumeric(cell);
                if (dependsOnMark && ambiguousCell == null) {
                    ambiguousCell = cell;
                    ambiguousLine = line;
                }
                return Reading.of(proved == null ? DecimalMark.POINT : proved, dependsOnMark && proved == null, false);
            }
        }
    }

    private Reading prove(DecimalMark mark) {
        if (proved == null) {
            proved = mark;
        }
        return Reading.of(proved, false, proved != mark);
    }

    /**
     * The mark the whole file is read with (empty when no number needs one).
     *
     * @throws DataProblemException when the numbers prove both marks
     */
    Optional<DecimalMark> decide(ProblemLog log) {
        if (requested.isPresent()) {
            return requested;
        }
        if (firstLine[0] > 0 && firstLine[1] > 0) {
            throw log.fatal(Math.max(firstLine[0], firstLine[1]), 0, "numbers use a decimal point (" + log.where(firstLine[0])
                    + ") and a decimal comma (" + log.where(firstLine[1]) + "); expected one convention per file, "
                    + "or --decimal-mark point|comma");
        }
        if (proved != null) {
            return Optional.of(proved);
        }
        if (ambiguousCell != null) {
            DecimalMark assumed = ambiguousCell.contains(",") ? DecimalMark.POINT : DecimalMark.COMMA;
            log.warn(ambiguousLine, 0, "'" + ambiguousCell + "' read as " + (assumed == DecimalMark.POINT
                    ? "a number with a thousands comma" : "a number with a thousands point")
                    + ", since no number in the file shows a decimal mark; set --decimal-mark if it is a fraction");
            return Optional.of(assumed);
        }
        return Optional.empty();
    }
}
