package org.twinorbit.fields;

/**
 * A closed polygon in the (R, Z) plane and the signed distance (m) to it: positive inside,
 * negative outside, continuous across the edge (an event detector can locate its zero). Inside
 * by the even-odd rule.
 */
public final class WallPolygon {

    private final double[] r;
    private final double[] z;

    /**
     * @param r the corners' R (m); a repeated first corner at the end is dropped
     * @param z the corners' Z (m)
     */
    public WallPolygon(double[] r, double[] z) {
        int n = r.length;
        if (n > 1 && r[0] == r[n - 1] && z[0] == z[n - 1]) {
            n--;
        }
        this.r = java.util.Arrays.copyOf(r, n);
        this.z = java.util.Arrays.copyOf(z, n);
    }

    public int size() { return r.length; }
    public double r(int i) { return r[i]; }
    public double z(int i) { return z[i]; }

    /** The signed distance (m) of (R, Z) (m) to the polygon's edges. */
    public double signedDistance(double pr, double pz) {
        double best = Double.POSITIVE_INFINITY;
        boolean inside = false;
        int n = r.length;
        for (int i = 0, j = n - 1; i < n; j = i++) {
            double ar = r[j], az = z[j], br = r[i], bz = z[i];
            double er = br - ar, ez = bz - az;
            double len2 = er * er + ez * ez;
            double t = len2 > 0 ? ((pr - ar) * er + (pz - az) * ez) / len2 : 0;
            t = Math.max(0, Math.min(1, t));
            double dr = pr - (ar + t * er), dz = pz - (az + t * ez);
            best = Math.min(best, dr * dr + dz * dz);
            if ((az > pz) != (bz > pz) && pr < ar + (pz - az) * er / ez) {
                inside = !inside;
            }
        }
        double d = Math.sqrt(best);
        return inside ? d : -d;
    }
}
