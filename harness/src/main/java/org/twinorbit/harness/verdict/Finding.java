package org.twinorbit.harness.verdict;

/**
 * A check that a row did not pass.
 *
 * @param check    what was checked
 * @param failure  true for a failure, false for a warning (never changes the exit code)
 * @param detail   the numbers behind it, for people
 * @param expected true when the case declares this failure as its point (e.g. RK4's energy loss)
 */
public record Finding(Check check, boolean failure, String detail, boolean expected) {

    /** The same finding, declared expected by the case. */
    public Finding asExpected() {
        return new Finding(check, failure, detail, true);
    }

    /** One line: "runaway: ...", "(expected) ...", "warning: ...". */
    public String describe() {
        return (failure ? "" : "warning ") + check.label() + (expected ? " (expected)" : "") + ": " + detail;
    }
}
