package org.twinorbit.shared;

/**
 * An immutable 3-vector for public APIs and recorded samples. Hot loops use {@code double[]}
 * buffers instead, so that no step allocates.
 *
 * @param x first Cartesian component (unit of the quantity it holds)
 * @param y second Cartesian component
 * @param z third Cartesian component
 */
public record Vec3(double x, double y, double z) {

    public static final Vec3 ZERO = new Vec3(0, 0, 0);
    public static final Vec3 X = new Vec3(1, 0, 0);
    public static final Vec3 Y = new Vec3(0, 1, 0);
    public static final Vec3 Z = new Vec3(0, 0, 1);

    /** Reads components 0..2 of {@code a}. */
    public static Vec3 of(double[] a) {
        return new Vec3(a[0], a[1], a[2]);
    }

    /** Writes the components into {@code out[0..2]} and returns {@code out}. */
    public double[] into(double[] out) {
        out[0] = x;
        out[1] = y;
        out[2] = z;
        return out;
    }

    public double[] toArray() {
        return new double[] {x, y, z};
    }

    public Vec3 plus(Vec3 o) {
        return new Vec3(x + o.x, y + o.y, z + o.z);
    }

    public Vec3 minus(Vec3 o) {
        return new Vec3(x - o.x, y - o.y, z - o.z);
    }

    public Vec3 times(double k) {
        return new Vec3(k * x, k * y, k * z);
    }

    public double dot(Vec3 o) {
        return x * o.x + y * o.y + z * o.z;
    }

    public Vec3 cross(Vec3 o) {
        return new Vec3(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
    }

    public double norm() {
        return Math.sqrt(dot(this));
    }

    /** The unit vector along this one; undefined (NaN) for the zero vector. */
    public Vec3 unit() {
        return times(1.0 / norm());
    }

    public boolean isFinite() {
        return Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z);
    }
}
