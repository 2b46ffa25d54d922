package org.twinorbit.harness.baseline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.twinorbit.harness.TestCommandLine;

/**
 * The project's own regression check: the current build against the committed baseline of
 * {@code suite --quick} (results/baseline-quick.json), inside the README's test command, so that
 * a change of any number of the quick suite fails CI. A change made on purpose is committed with
 * a refreshed baseline (README "Regression checks in CI", results/README.md).
 */
class CommittedBaselineTest {

    /** Surefire runs in the harness module's directory. */
    static final Path BASELINE = Path.of("..", "results", "baseline-quick.json");

    /**
     * Source: derived — the numbers are deterministic for any thread count (README), so the
     * build that matches the committed baseline reproduces it with no difference at all.
     */
    @ParameterizedTest
    @ValueSource(strings = {"1", "2"})
    void currentBuildMatchesTheCommittedQuickSuite(String threads) {
        assertTrue(Files.exists(BASELINE), "committed baseline " + BASELINE.toAbsolutePath());
        TestCommandLine.Outcome o = TestCommandLine.exec("check", BASELINE.toString(), "--threads", threads);
        assertEquals(0, o.code(), "the quick suite's numbers changed; if on purpose, refresh the baseline "
                + "(README, 'Regression checks in CI'):\n" + o.out() + o.err());
        assertTrue(o.out().contains("No differences."), o.out());
    }
}
