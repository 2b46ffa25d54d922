package org.twinorbit.fields;

import java.util.Arrays;
import java.util.stream.Collectors;

/** The coordinate systems a grid file may use (the root attribute {@code geometry} of {@link GridFile}). */
public enum GridGeometry {
    /** Nodes on (x, y, z), B as (B_x, B_y, B_z); tricubic interpolation. */
    CARTESIAN("cartesian"),
    /** Nodes on (R, φ, Z) with φ covering one full turn, B as (B_R, B_φ, B_Z); tricubic, φ periodic. */
    CYLINDRICAL("cylindrical"),
    /** Nodes on (R, Z), the field independent of φ, B as (B_R, B_φ, B_Z); bicubic. */
    AXISYMMETRIC("axisymmetric");

    private final String key;

    GridGeometry(String key) {
        this.key = key;
    }

    /** The name in files and on the command line. */
    public String key() {
        return key;
    }

    /** The allowed names, comma-separated. */
    public static String allowed() {
        return Arrays.stream(values()).map(GridGeometry::key).collect(Collectors.joining(", "));
    }

    /** @throws IllegalArgumentException naming the allowed values */
    public static GridGeometry parse(String s) {
        for (GridGeometry g : values()) {
            if (g.key.equals(s)) {
                return g;
            }
        }
        throw new IllegalArgumentException("'" + s + "' is not a grid geometry; allowed: " + allowed());
    }
}
