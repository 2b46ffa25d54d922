package org.twinorbit.integrators;

/** How an orbit integration stands or ended. */
public enum OrbitStatus {
    /** Still running, or ran to the requested end time. */
    OK("ok"),
    /** Left the field's domain (escaped a mirror, hit the planet, reached the wall); not an error. */
    LOST("lost"),
    /** The state became NaN or infinite, or the energy blew up: the integrator failed. */
    UNSTABLE("unstable"),
    /** The guiding-center model itself broke down (B*∥ ≤ 0). */
    MODEL_FAILURE("model-failure"),
    /** The integrator threw an exception: its code failed, not the orbit. */
    FAILED("failed");

    private final String label;

    OrbitStatus(String label) {
        this.label = label;
    }

    /** The word used in tables and JSON. */
    public String label() {
        return label;
    }
}
