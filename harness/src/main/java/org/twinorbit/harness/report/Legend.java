package org.twinorbit.harness.report;

/** What the table columns mean, printed under every results table for people. */
final class Legend {

    private Legend() {}

    static final String TEXT = """
            Columns give the worst phase of the gyrophase ensemble, sign kept (the JSON and CSV also have the
            phase mean of the signed values and the rms over phases).
            mu change: max over gyrations of |<mu>_k - <mu>_0|/<mu>_0, mu averaged over each whole gyration in the
            local ExB frame; ref mu change: the same for the full-orbit reference of the same phases (pusher
            rows), the physical ripple: a mu change near it is physics, one far above it is discretisation error;
            mu jump: the irreversible part, <mu> compared at equivalent points of the slow motion:
            the first whole gyration against the first after the sheet exit (crossings runs), else the mirror
            points of the same direction (two or more), else first against last gyration; the points used are
            named in the case description (JSON: mu_jump_from); energy err: max |W - W0|/K0 with W = kinetic + q Phi;
            invariant err: largest drift of an exact invariant over its scale at the start (m|u| or m|u|R);
            phase err: phi/phi_ref - 1, the gyrophase turned by the row over the gyrophase the reference turned
            in the same time (negative: the gyration lags); drift err: mean perpendicular guiding-center
            velocity over whole periods against the reference, the component along the reference drift,
            relative (negative: slower); center pos err/rho: error of the gyro-averaged center (the guiding
            center), |X - X_ref| at the end over rho0, per bounce period (whole periods, at least 1), positive
            when ahead along the reference motion; particle pos err/rho: the particle itself against the
            reference particle at the end time, |x - x_ref|/rho0, positive when ahead along the reference
            particle's velocity (full-orbit rows; up to 2 from the gyrophase alone); bounce err: bounce
            period / reference - 1; class: trapped, passing or lost; order: measured from dt, dt/2, dt/4, dt/8;
            "—": not defined for this row.
            The mu change and mu jump of an integrator row are its own; the model row carries those of the
            exact (reference) full orbit, which the guiding-center model takes as constant, so the difference
            between the two is the integrator's share.
            """;
}
