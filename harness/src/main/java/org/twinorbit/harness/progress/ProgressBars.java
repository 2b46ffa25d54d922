package org.twinorbit.harness.progress;

import java.time.temporal.ChronoUnit;
import java.util.function.Supplier;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.DefaultProgressBarRenderer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarConsumer;
import me.tongfei.progressbar.ProgressBarStyle;
import me.tongfei.progressbar.ProgressState;

/**
 * The progress bars of the command line, on stderr: the percentage, the bar, what is counted
 * ("12/40 points", "5/18 jobs"), the time spent and the time left from {@link TimeLeft}.
 */
public final class ProgressBars {

    private static final int UPDATE_MS = 250;

    private ProgressBars() {}

    /**
     * A bar on stderr.
     *
     * @param label   shown first
     * @param max     the bar's full length (any unit; the percentage is current/max)
     * @param current where the bar starts
     * @param count   what the bar counts, read at every redraw, e.g. "12/40 points"
     * @param time    the clock of the work, for the time spent and the time left
     */
    public static ProgressBar onStderr(String label, long max, long current, Supplier<String> count, TimeLeft time) {
        return build(label, max, current, count, time, new ConsoleProgressBarConsumer(System.err));
    }

    /** As {@link #onStderr}, drawn into {@code consumer} (tests). */
    static ProgressBar build(String label, long max, long current, Supplier<String> count, TimeLeft time,
                             ProgressBarConsumer consumer) {
        return new ProgressBarBuilder().setTaskName(label).setInitialMax(max).setConsumer(consumer)
                .setUpdateIntervalMillis(UPDATE_MS).startsFrom(current, time.elapsed())
                .setRenderer(new CountRenderer(count, time)).build();
    }

    /** The library's renderer with our count in place of its "current/max unit" ratio. */
    private static final class CountRenderer extends DefaultProgressBarRenderer {
        private final Supplier<String> count;

        CountRenderer(Supplier<String> count, TimeLeft time) {
            super(ProgressBarStyle.COLORFUL_UNICODE_BLOCK, "", 1, false, null, ChronoUnit.SECONDS, true,
                    state -> time.remaining());
            this.count = count;
        }

        @Override
        protected String ratio(ProgressState state) {
            return count.get();
        }
    }

    /** "done/total unit", the done count padded to the width of the total so the bar does not jump. */
    public static String count(long done, long total, String unit) {
        String t = Long.toString(total);
        return String.format(java.util.Locale.ROOT, "%" + t.length() + "d/%s %s", done, t, unit);
    }
}
