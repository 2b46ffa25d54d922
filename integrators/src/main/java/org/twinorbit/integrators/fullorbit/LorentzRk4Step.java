package org.twinorbit.integrators.fullorbit;

/**
 * One classic fourth-order Runge–Kutta step (Kutta 1901; Hairer, Nørsett & Wanner, Solving
 * Ordinary Differential Equations I, 1993, §II.1, section from memory) of the {@link LorentzEquations}, in place on a
 * 6-component state with preallocated stage buffers.
 */
final class LorentzRk4Step {

    private final LorentzEquations equations;
    private final double[] k1 = new double[6], k2 = new double[6], k3 = new double[6], k4 = new double[6];
    private final double[] stage = new double[6];

    LorentzRk4Step(LorentzEquations equations) {
        this.equations = equations;
    }

    /** Advances y (m, m/s) from t to t + dt (s). */
    void advance(double t, double dt, double[] y) {
        double half = 0.5 * dt;
        equations.derivatives(t, y, k1);
        for (int i = 0; i < 6; i++) {
            stage[i] = y[i] + half * k1[i];
        }
        equations.derivatives(t + half, stage, k2);
        for (int i = 0; i < 6; i++) {
            stage[i] = y[i] + half * k2[i];
        }
        equations.derivatives(t + half, stage, k3);
        for (int i = 0; i < 6; i++) {
            stage[i] = y[i] + dt * k3[i];
        }
        equations.derivatives(t + dt, stage, k4);
        double sixth = dt / 6.0;
        for (int i = 0; i < 6; i++) {
            y[i] += sixth * (k1[i] + 2.0 * (k2[i] + k3[i]) + k4[i]);
        }
    }

    LorentzEquations equations() {
        return equations;
    }
}
