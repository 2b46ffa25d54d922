package org.twinorbit.harness.verdict;

import java.util.List;

/**
 * The verdict on one integrator row of one case.
 *
 * @param caseName   the case
 * @param integrator the row's integrator
 * @param findings   the checks it did not pass, in {@link Check} order; empty when it passed all
 */
public record RowVerdict(String caseName, String integrator, List<Finding> findings) {

    public RowVerdict {
        findings = List.copyOf(findings);
    }

    /** True when a failure is not declared expected: the run exits 1. */
    public boolean failed() {
        return findings.stream().anyMatch(f -> f.failure() && !f.expected());
    }

    /** {@code pass}, {@code expected-fail} (only declared failures), {@code fail}. */
    public String label() {
        if (failed()) {
            return "fail";
        }
        return findings.stream().anyMatch(Finding::failure) ? "expected-fail" : "pass";
    }
}
