package dev.coilwise.error;

/** Root of every exception coilwise throws on purpose. Unchecked; the CLI maps the subtype to an exit code. */
public abstract class CoilwiseException extends RuntimeException {
    protected CoilwiseException(String message) {
        super(message);
    }

    protected CoilwiseException(String message, Throwable cause) {
        super(message, cause);
    }
}
