package org.twinorbit.fields;

/** A user asked for an unknown field, an unknown parameter or a value out of its range. */
public class FieldParameterException extends IllegalArgumentException {
    public FieldParameterException(String message) {
        super(message);
    }
}
