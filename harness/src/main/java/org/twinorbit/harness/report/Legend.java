package org.twinorbit.harness.report;

/** What the table columns mean, printed under every results table for people. */
final class Legend {

    private Legend() {}

    static final String TEXT = """
            Columns give the worst phase of the gyrophase ensemble, sign kept (the JSON and CSV also have the
            phase mean of the signed values and the rms over phases).
            mu change: max over gyrations of |<mu>_k - <mu>_0|/<mu>_0, mu averaged over each whole gyration in the
            local ExB frame; mu jump: the irreversible part, <mu> compared at equivalent points of the slow motion:
            the first whole gyration against the first after the sheet exit (crossings runs), else the mirror
            points of the same direction (two or more), else first against last gyration; the points used are
            printed under the table (JSON: mu_jump_from); energy err: max |W - W0|/K0 with W = kinetic + q Phi;
            invariant err: largest drift of an exact invariant over its scale at the start (m|u| or m|u|R);
            phase err: measured gyrofrequency / reference - 1; drift err: mean perpendicular guiding-center
            velocity over whole periods against the reference, the component along the reference drift,
            relative (negative: slower); pos err/rho: |X - X_ref| at the end over rho0, per bounce period
            (whole periods, at least 1), positive when ahead along the reference motion; bounce err: bounce
            period / reference - 1; class: trapped, passing or lost; order: measured from dt, dt/2, dt/4;
            "—": not defined for this row.
            The mu change and mu jump of an integrator row are its own; the model row carries those of the
            exact (reference) full orbit, which the guiding-center model takes as constant, so the difference
            between the two is the integrator's share.
            """;
}
