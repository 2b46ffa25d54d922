package org.twinorbit.fields;

/**
 * Flux surfaces of an {@link AxisymmetricEquilibrium} found along rays from the magnetic axis:
 * the point R = R_ax + ρ cos θ, Z = Z_ax + ρ sin θ where the normalised flux
 * ψ_N = (ψ − ψ_axis)/(ψ_boundary − ψ_axis) reaches a level, by bracketing and bisection (ψ_N
 * grows monotonically outward inside the last closed surface).
 */
public final class FluxSurfaces {

    private final AxisymmetricEquilibrium eq;
    private final double rAxis;
    private final double zAxis;
    private final double psiAxis;
    private final double psiSpan;
    private final double step;

    /** @param step the bracketing step along a ray (m), well below the minor radius */
    public FluxSurfaces(AxisymmetricEquilibrium eq, double step) {
        this.eq = eq;
        double[] ax = eq.axis();
        this.rAxis = ax[0];
        this.zAxis = ax[1];
        this.psiAxis = eq.psiAxis();
        this.psiSpan = eq.psiBoundary() - psiAxis;
        this.step = step;
    }

    /** ψ_N at (R, Z) (m). */
    public double normalisedFlux(double r, double z) {
        double[] p = new double[6];
        eq.psi(r, z, p);
        return (p[0] - psiAxis) / psiSpan;
    }

    /** The distance ρ (m) from the axis along angle θ (rad) at which ψ_N = level, 0 &lt; level ≤ 1. */
    public double radius(double theta, double level) {
        double c = Math.cos(theta);
        double s = Math.sin(theta);
        double lo = 0;
        double hi = step;
        while (normalisedFlux(rAxis + hi * c, zAxis + hi * s) < level) {
            lo = hi;
            hi += step;
            if (hi > 1e3 * step) {
                throw new IllegalStateException("no flux surface " + level + " along angle " + theta);
            }
        }
        for (int i = 0; i < 100 && hi - lo > 1e-15 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (normalisedFlux(rAxis + mid * c, zAxis + mid * s) < level) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** The point {R, Z} (m) of the surface ψ_N = level at angle θ (rad). */
    public double[] point(double theta, double level) {
        double rho = radius(theta, level);
        return new double[] {rAxis + rho * Math.cos(theta), zAxis + rho * Math.sin(theta)};
    }

    /**
     * The safety factor of the surface ψ_N = level, |q| = (1/2π) |∮ (B·∇φ)/(B·∇θ) dθ| (field-line
     * pitch; Wesson, Tokamaks, 4th ed., 2011, §3.3, from memory), with B·∇φ = F/R² and
     * B·∇θ = (B_Z cos θ − B_R sin θ)/ρ, by the trapezoidal rule over n angles (spectrally accurate
     * for this smooth periodic integrand).
     */
    public double safetyFactor(double level, int n) {
        double[] p = new double[6];
        double sum = 0;
        for (int k = 0; k < n; k++) {
            double th = 2 * Math.PI * k / n;
            double c = Math.cos(th);
            double s = Math.sin(th);
            double rho = radius(th, level);
            double r = rAxis + rho * c;
            double z = zAxis + rho * s;
            eq.psi(r, z, p);
            double bR = -p[2] / r;
            double bZ = p[1] / r;
            double f = eq.f(p[0]);
            sum += (f / (r * r)) * rho / (bZ * c - bR * s);
        }
        return Math.abs(sum / n);
    }

    /**
     * The toroidal plasma current (A) inside the last closed surface, ∫ j_φ dA with
     * μ0 j_φ = −Δ*ψ / R = −(ψ_RR − ψ_R/R + ψ_ZZ)/R (Ampère's law for B = ∇ψ × ∇φ + F∇φ), in polar
     * coordinates about the axis: trapezoidal rule over nTheta angles, Gauss–Legendre over the
     * radius. Positive along +φ.
     */
    public double plasmaCurrent(int nTheta) {
        double[] p = new double[6];
        double[] nodes = GaussLegendre.NODES;
        double[] weights = GaussLegendre.WEIGHTS;
        double sum = 0;
        for (int k = 0; k < nTheta; k++) {
            double th = 2 * Math.PI * k / nTheta;
            double c = Math.cos(th);
            double s = Math.sin(th);
            double rhoB = radius(th, 1.0);
            double inner = 0;
            for (int i = 0; i < nodes.length; i++) {
                double rho = 0.5 * rhoB * (nodes[i] + 1);
                double r = rAxis + rho * c;
                eq.psi(r, zAxis + rho * s, p);
                double jphi = -(p[3] - p[1] / r + p[5]) / (SolovevField.MU0 * r);
                inner += weights[i] * jphi * rho;
            }
            sum += 0.5 * rhoB * inner;
        }
        return sum * 2 * Math.PI / nTheta;
    }
}
