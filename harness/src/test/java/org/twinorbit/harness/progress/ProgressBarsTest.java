package org.twinorbit.harness.progress;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarConsumer;
import org.junit.jupiter.api.Test;

/**
 * What the bar reads: a percentage, a count of what it counts, and the time left. Software
 * behaviour only, no physics values (time left = work left / rate of the work done in this
 * process is common practice).
 */
class ProgressBarsTest {

    /** Keeps what the bar draws. */
    private static final class Drawn implements ProgressBarConsumer {
        final List<String> lines = new ArrayList<>();

        @Override
        public int getMaxRenderedLength() {
            return 120;
        }

        @Override
        public synchronized void accept(String line) {
            lines.add(line.replaceAll("\u001b\\[[0-9;]*m", ""));
        }

        @Override
        public void close() {}

        synchronized String last() {
            return lines.get(lines.size() - 1);
        }
    }

    /** A bar over estimated cost used to read "28/100%": now "28%" and the jobs done. */
    @Test
    void aCostBarReadsAPercentageAndTheJobs() {
        AtomicLong now = new AtomicLong();
        TimeLeft time = new TimeLeft(now::get);
        time.start(1000, 0);
        now.addAndGet(14_000_000_000L);
        time.done(280);
        Drawn drawn = new Drawn();
        ProgressBar bar = ProgressBars.build("orbits", 1000, 280, () -> ProgressBars.count(5, 18, "jobs"), time, drawn);
        bar.close();
        String line = drawn.last();
        assertTrue(line.contains(" 28% "), line);
        assertTrue(line.contains(" 5/18 jobs "), line);
        assertFalse(line.contains("/100"), line);
        // 280 units in 14 s: 36 s for the 720 left
        assertTrue(line.contains("/ 0:00:36)"), line);
    }

    @Test
    void countsArePaddedToTheTotalsWidth() {
        assertTrue(ProgressBars.count(7, 200, "points").equals("  7/200 points"));
    }
}
