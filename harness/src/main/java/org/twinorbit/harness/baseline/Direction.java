package org.twinorbit.harness.baseline;

/** Which way a change of a metric counts as worse. */
public enum Direction {
    /** An error: a larger magnitude is worse, a smaller one an improvement. */
    SMALLER_IS_BETTER,
    /** A fraction of agreement: a smaller value is worse. */
    LARGER_IS_BETTER,
    /** A measured value with no better side (a period, an order, ε*): any change counts. */
    NONE
}
