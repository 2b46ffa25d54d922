package org.twinorbit.harness.scan;

/** Told how a scan advances; implementations must be thread-safe. */
public interface ScanProgress {

    /** Does nothing: for tests and {@code --quiet}. */
    ScanProgress NONE = new ScanProgress() {
        @Override
        public void start(int total, int alreadyDone) {}

        @Override
        public void pointDone() {}
    };

    /** The scan has {@code total} points, of which {@code alreadyDone} were resumed from disk. */
    void start(int total, int alreadyDone);

    /**
     * More points resumed from disk after the start (the later scans of a resumed safe-use map);
     * a watcher that only counts computed points may ignore them.
     */
    default void resumed(int points) {}

    /** One more point computed. */
    void pointDone();
}
