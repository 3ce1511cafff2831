package org.annalist.ingest;

/** What a workbook reader gives of one sheet, as it reads it. */
interface SheetSink {

    /**
     * The next row that has a cell with content.
     *
     * @param number the row's 1-based number, as the spreadsheet shows it
     * @param cells  the cells' text by 0-based column (null or empty for an empty cell); the array is the sink's
     * @param hidden whether the row is hidden in the workbook
     * @return false to stop reading the sheet
     */
    boolean row(int number, String[] cells, boolean hidden);

    /** A column (1-based) hidden in the workbook. */
    void hiddenColumn(int column);

    /** Something about one cell (a row and a 1-based column) worth a warning: an error value, a formula with no result. */
    void cellNote(int row, int column, String message);

    /** Does nothing with what it is given (to look at the first rows of a sheet). */
    static SheetSink rows(RowsOnly rows) {
        return new SheetSink() {
            @Override
            public boolean row(int number, String[] cells, boolean hidden) {
                return rows.row(number, cells);
            }

            @Override
            public void hiddenColumn(int column) {
                // not needed to look at a sheet
            }

            @Override
            public void cellNote(int row, int column, String message) {
                // not needed to look at a sheet
            }
        };
    }

    /** Only the rows. */
    interface RowsOnly {
        boolean row(int number, String[] cells);
    }
}
