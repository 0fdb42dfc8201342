package dev.coilwise.error;

/**
 * Input that is wrong or contradicts itself: a value out of range, a bad unit, an unknown key. Exit code 2.
 * Not final so that a file reader can throw a subtype that carries every problem of the file with its position.
 */
public class BadInputException extends CoilwiseException {
    public BadInputException(String message) {
        super(message);
    }

    public BadInputException(String message, Throwable cause) {
        super(message, cause);
    }

    /** Builds the exception from a message template and its arguments. */
    public static BadInputException of(Message template, Object... args) {
        return new BadInputException(template.format(args));
    }
}
