package dev.coilwise.error;

/** A state that valid input should never reach: a solver that failed to bracket, a broken invariant. Exit code 1. */
public final class InternalFaultException extends CoilwiseException {
    public InternalFaultException(String message) {
        super(message);
    }

    public InternalFaultException(String message, Throwable cause) {
        super(message, cause);
    }
}
