package org.annalist.ingest;

/**
 * Where in an input file a problem is: a line and column of a text file (CSV, SDMX-CSV, the bulk tab
 * layout, a JSON-stat file's line), or a row and cell of a workbook's sheet, in the A1 notation a
 * spreadsheet shows (ECMA-376 Part 1 §18.3.1.4, cell reference; OpenDocument uses the same letters).
 * A problem's message and its cross-references ("first on line 4", "first in row 4") are worded from
 * the same place, so that a workbook's problems never speak of lines.
 */
public sealed interface Place {

    /** 1-based line (or row); 0 for the whole file. */
    int line();

    /** 1-based column; 0 for the whole line (or row). */
    int column();

    /** The place as a message's lead names it: {@code 12:3} for text, {@code cell C12} for a sheet. */
    String lead();

    /** The place as a sentence names it: {@code line 12}, {@code row 12}, {@code cell C12}. */
    String inWords();

    /** The same kind of place at another line and column. */
    Place at(int line, int column);

    /** A place of a text file. */
    record Text(int line, int column) implements Place {
        @Override
        public String lead() {
            return line <= 0 ? "" : column > 0 ? line + ":" + column : Integer.toString(line);
        }

        @Override
        public String inWords() {
            return line <= 0 ? "the file" : column > 0 ? "line " + line + ", column " + column : "line " + line;
        }

        @Override
        public Place at(int otherLine, int otherColumn) {
            return new Text(otherLine, otherColumn);
        }
    }

    /** A place of a workbook's sheet. */
    record Cell(String sheet, int line, int column) implements Place {
        @Override
        public String lead() {
            return "sheet '" + sheet + "'" + (line <= 0 ? "" : ", " + inWords());
        }

        @Override
        public String inWords() {
            return line <= 0 ? "sheet '" + sheet + "'" : column > 0 ? "cell " + DataProblem.columnLetters(column) + line
                    : "row " + line;
        }

        @Override
        public Place at(int otherLine, int otherColumn) {
            return new Cell(sheet, otherLine, otherColumn);
        }
    }
}
