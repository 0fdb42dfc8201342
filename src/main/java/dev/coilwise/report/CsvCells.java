package dev.coilwise.report;

/**
 * Makes text cells safe to open in a spreadsheet: a cell from outside input that starts with =, +, -, @, a tab or a
 * carriage return would be run as a formula by some spreadsheet programs, so it gets a leading apostrophe (the OWASP
 * advice on CSV injection).
 */
public final class CsvCells {
    private CsvCells() {
    }

    public static String safe(String cell) {
        if (cell == null || cell.isEmpty()) {
            return cell;
        }
        char c = cell.charAt(0);
        if (c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r') {
            return "'" + cell;
        }
        return cell;
    }
}
