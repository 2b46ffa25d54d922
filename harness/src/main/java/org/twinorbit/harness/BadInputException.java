package org.twinorbit.harness;

/** A user mistake detected after parsing (a file that cannot be read, a bad YAML case). */
public class BadInputException extends RuntimeException {
    public BadInputException(String message) {
        super(message);
    }

    public BadInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
