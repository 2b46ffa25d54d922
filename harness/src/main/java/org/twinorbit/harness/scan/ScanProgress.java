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

    /** One more point finished. */
    void pointDone();
}
