package org.fatefield.circuits.expr;

/** A rate law that cannot be read, with the 1-based column where the problem is. */
public final class ExpressionException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final int column;

    /**
     * @param message what is wrong and what was expected
     * @param column  1-based column in the expression text
     */
    public ExpressionException(String message, int column) {
        super(message + " (column " + column + ")");
        this.column = column;
    }

    /** 1-based column in the expression text. */
    public int column() {
        return column;
    }
}
