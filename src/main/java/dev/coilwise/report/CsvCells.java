package dev.coilwise.report;

/**
 * Makes text cells safe to open in a spreadsheet: a cell from outside input (a part number, a supplier, a title) that
 * starts with =, +, -, @, a tab or a carriage return would be run as a formula by some spreadsheet programs, so it
 * gets a leading apostrophe (the OWASP advice on CSV injection). Blanks before the sign and the full-width forms of
 * the signs (＝ ＋ － ＠), which some spreadsheet programs also read as formula starts, are treated the same. Numbers
 * coilwise computes are never passed through here: a negative margin stays a number.
 */
public final class CsvCells {
    private CsvCells() {
    }

    public static String safe(String cell) {
        if (cell == null || cell.isEmpty()) {
            return cell;
        }
        if (cell.charAt(0) == '\t' || cell.charAt(0) == '\r') {
            return "'" + cell;
        }
        int i = 0;
        while (i < cell.length() && (cell.charAt(i) == ' ' || cell.charAt(i) == '\u00a0' || cell.charAt(i) == '\u3000')) {
            i++;
        }
        if (i < cell.length() && "=+-@\uff1d\uff0b\uff0d\uff20".indexOf(cell.charAt(i)) >= 0) {
            return "'" + cell;
        }
        return cell;
    }
}
