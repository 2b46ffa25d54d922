package org.twinorbit.fields;

import org.twinorbit.shared.FieldSample;

/**
 * From a field in cylindrical components (B_R, B_φ, B_Z) with derivatives in (R, φ, Z) to the
 * Cartesian B and Jacobian ∂B_i/∂x_j that the rest of the code uses. With
 * B_x = B_R cos φ − B_φ sin φ, B_y = B_R sin φ + B_φ cos φ, B_z = B_Z, the derivatives along φ
 * pick up the rotation of the basis (∂R̂/∂φ = φ̂, ∂φ̂/∂φ = −R̂), and the chain rule
 * ∂/∂x = cos φ ∂/∂R − (sin φ/R) ∂/∂φ, ∂/∂y = sin φ ∂/∂R + (cos φ/R) ∂/∂φ, ∂/∂z = ∂/∂Z
 * (common practice) gives the Cartesian Jacobian.
 */
final class CylindricalBasis {

    private CylindricalBasis() {}

    /**
     * @param r   R (m), &gt; 0
     * @param cos cos φ
     * @param sin sin φ
     * @param b   B_R, B_φ, B_Z (T)
     * @param g   g[c][a] = ∂B_c/∂(R, φ, Z)[a] (T/m along R and Z, T/rad along φ)
     * @param out receives B and the Jacobian; nothing else is touched
     */
    static void toCartesian(double r, double cos, double sin, double[] b, double[][] g, FieldSample out) {
        double br = b[0], bp = b[1];
        out.bx = br * cos - bp * sin;
        out.by = br * sin + bp * cos;
        out.bz = b[2];
        // derivatives of the Cartesian components along R, φ, Z
        double xR = cos * g[0][0] - sin * g[1][0];
        double yR = sin * g[0][0] + cos * g[1][0];
        double zR = g[2][0];
        double xP = cos * g[0][1] - sin * g[1][1] - sin * br - cos * bp;
        double yP = sin * g[0][1] + cos * g[1][1] + cos * br - sin * bp;
        double zP = g[2][1];
        double xZ = cos * g[0][2] - sin * g[1][2];
        double yZ = sin * g[0][2] + cos * g[1][2];
        double zZ = g[2][2];
        double sr = sin / r, cr = cos / r;
        double[] d = out.dB;
        d[0] = cos * xR - sr * xP;
        d[1] = sin * xR + cr * xP;
        d[2] = xZ;
        d[3] = cos * yR - sr * yP;
        d[4] = sin * yR + cr * yP;
        d[5] = yZ;
        d[6] = cos * zR - sr * zP;
        d[7] = sin * zR + cr * zP;
        d[8] = zZ;
    }

    /**
     * E = −∇Φ (V/m) into out from the derivatives of Φ along R (V/m), φ (V/rad) and Z (V/m).
     *
     * @param r R (m), &gt; 0
     */
    static void electricField(double r, double cos, double sin, double[] g, FieldSample out) {
        out.ex = -(cos * g[0] - sin / r * g[1]);
        out.ey = -(sin * g[0] + cos / r * g[1]);
        out.ez = -g[2];
    }
}
