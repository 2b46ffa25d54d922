package org.twinorbit.harness.report;

/** What the table columns mean, printed under every results table for people. */
final class Legend {

    private Legend() {}

    static final String TEXT = """
            Columns give the worst case over the gyrophase ensemble (the JSON also has the mean).
            mu change: max over gyrations of |<mu>_k - <mu>_0|/<mu>_0, mu averaged over each whole gyration in the
            local ExB frame; mu jump: the irreversible part, <mu> compared at equivalent points of the bounce
            (mirror points of the same direction), or first against last gyration without a bounce; energy err:
            max |W - W0|/K0 with W = kinetic + q Phi; invariant err: largest drift of an exact invariant over
            its scale at the start (m|u| or m|u|R); phase err: measured gyrofrequency / reference - 1; drift
            err: mean perpendicular guiding-center velocity over whole periods against the reference, relative;
            pos err/rho: |X - X_ref| at the end over rho0; bounce err: bounce period / reference - 1; class:
            trapped, passing or lost; order: measured from dt, dt/2, dt/4; "—": not defined for this row.
            The mu change and mu jump of an integrator row are its own; the model row carries those of the
            exact (reference) full orbit, which the guiding-center model takes as constant, so the difference
            between the two is the integrator's share.
            """;
}
