package org.twinorbit.fields;

import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import io.jhdf.api.Attribute;
import io.jhdf.api.Dataset;
import io.jhdf.api.WritableDataset;
import java.nio.file.Files;
import java.nio.file.Path;
import org.twinorbit.shared.FieldSample;

/**
 * Gridded static magnetic fields in an HDF5 layout of our own, read and written with the
 * pure-Java jHDF library. The root attribute {@code geometry} (a string) names the coordinate
 * system; a file without it is {@code cartesian}. Every dataset is 64-bit floats and carries its
 * unit as the string attribute {@code unit} ({@code m}, {@code rad} or {@code T}; a file without
 * unit attributes is read in these units, one with another unit is refused). Axes are uniform,
 * increasing, with at least 4 nodes.
 * <pre>
 * geometry = cartesian
 *   /x_m, /y_m, /z_m          the nodes (m)
 *   /bx_t, /by_t, /bz_t       B (T), [nx][ny][nz]
 * geometry = cylindrical
 *   /r_m                      the R nodes (m), all &gt; 0
 *   /phi_rad                  the φ nodes (rad): n nodes spaced 2π/n, one full turn (φ periodic)
 *   /z_m                      the Z nodes (m)
 *   /br_t, /bphi_t, /bz_t     B_R, B_φ, B_Z (T), [nr][nphi][nz]
 * geometry = axisymmetric
 *   /r_m, /z_m                the R (all &gt; 0) and Z nodes (m)
 *   /br_t, /bphi_t, /bz_t     B_R, B_φ, B_Z (T), [nr][nz]
 * every geometry
 *   /length_m                 [1]: the length L (m) that defines ε = ρ0/L
 *   /phi_v                    optional: the electrostatic potential Φ (V) on the nodes, shaped like
 *                             the B components; E = −∇Φ of its interpolant
 *   /wall_r_m, /wall_z_m      optional, together: the corners (m) of a wall polygon in (R, Z), at
 *                             least 3, the same count in each; for cartesian R = √(x² + y²), Z = z
 * </pre>
 * The domain is the grid (box or annulus), inside the wall when there is one; a particle leaving
 * the grid or crossing the wall is lost ({@link WallPolygon}'s signed distance). Fields are static. A field of the library is named {@code grid:PATH} to load one
 * ({@link Fields#create}).
 */
public final class GridFile {

    /** The prefix of a field name that names a grid file. */
    public static final String PREFIX = "grid:";

    private static final String GEOMETRY = "geometry";
    private static final String UNIT = "unit";
    private static final String POTENTIAL = "phi_v";
    private static final String WALL_R = "wall_r_m";
    private static final String WALL_Z = "wall_z_m";

    private GridFile() {}

    /** @throws FieldParameterException naming the file, the dataset and what is wrong with it */
    public static GriddedField read(Path file) {
        String where = "field " + PREFIX + file;
        if (!Files.isRegularFile(file)) {
            throw new FieldParameterException(where + ": no such file");
        }
        try (HdfFile h = new HdfFile(file)) {
            GriddedFieldBase f = grid(h, file, where);
            f.setWall(wall(h, where));
            return f;
        } catch (FieldParameterException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new FieldParameterException(where + ": not a readable grid file (" + e.getMessage() + ")");
        }
    }

    private static GriddedFieldBase grid(HdfFile h, Path file, String where) {
        GridGeometry g = geometry(h, where);
        String name = PREFIX + file;
        String meaning = "L from the grid file (/length_m)";
        switch (g) {
            case CARTESIAN -> {
                double[][] axes = {axis(h, "x_m", "m", where), axis(h, "y_m", "m", where), axis(h, "z_m", "m", where)};
                double[][][][] b = new double[3][][][];
                String[] bn = {"bx_t", "by_t", "bz_t"};
                for (int c = 0; c < 3; c++) {
                    b[c] = cube(h, bn[c], "T", where, axes[0].length, axes[1].length, axes[2].length);
                }
                double[][][] pot = h.getChildren().containsKey(POTENTIAL)
                        ? cube(h, POTENTIAL, "V", where, axes[0].length, axes[1].length, axes[2].length) : null;
                return new GridField(name, axes, b, pot, length(h, where), meaning);
            }
            case CYLINDRICAL -> {
                double[] r = radius(h, where);
                double[] phi = turn(h, where);
                double[] z = axis(h, "z_m", "m", where);
                double[][][][] b = new double[3][][][];
                String[] bn = {"br_t", "bphi_t", "bz_t"};
                for (int c = 0; c < 3; c++) {
                    b[c] = cube(h, bn[c], "T", where, r.length, phi.length, z.length);
                }
                double[][][] pot = h.getChildren().containsKey(POTENTIAL)
                        ? cube(h, POTENTIAL, "V", where, r.length, phi.length, z.length) : null;
                return new CylindricalGridField(name, r, phi, z, b, pot, length(h, where), meaning);
            }
            default -> {
                double[] r = radius(h, where);
                double[] z = axis(h, "z_m", "m", where);
                double[][][] b = new double[3][][];
                String[] bn = {"br_t", "bphi_t", "bz_t"};
                for (int c = 0; c < 3; c++) {
                    b[c] = square(h, bn[c], "T", where, r.length, z.length);
                }
                double[][] pot = h.getChildren().containsKey(POTENTIAL)
                        ? square(h, POTENTIAL, "V", where, r.length, z.length) : null;
                return new AxisymmetricGridField(name, r, z, b, pot, length(h, where), meaning);
            }
        }
    }

    /** The optional wall: both datasets or neither, the same count of at least 3 finite corners (m). */
    private static WallPolygon wall(HdfFile h, String where) {
        boolean hasR = h.getChildren().containsKey(WALL_R), hasZ = h.getChildren().containsKey(WALL_Z);
        if (!hasR && !hasZ) {
            return null;
        }
        double[] r = vector(h, WALL_R, "m", where);
        double[] z = vector(h, WALL_Z, "m", where);
        if (r.length != z.length) {
            throw new FieldParameterException(where + ": /" + WALL_R + " has " + r.length + " corners and /" + WALL_Z
                    + " has " + z.length + "; the wall polygon needs the same count in each");
        }
        WallPolygon w = new WallPolygon(r, z);
        if (w.size() < 3) {
            throw new FieldParameterException(where + ": /" + WALL_R + ", /" + WALL_Z + " hold " + w.size()
                    + " distinct corners; the wall polygon needs at least 3");
        }
        return w;
    }

    private static GridGeometry geometry(HdfFile h, String where) {
        Attribute a = h.getAttribute(GEOMETRY);
        if (a == null) {
            return GridGeometry.CARTESIAN;
        }
        Object v = a.getData();
        try {
            return GridGeometry.parse(String.valueOf(v).trim());
        } catch (IllegalArgumentException e) {
            throw new FieldParameterException(where + ": root attribute '" + GEOMETRY + "' is '" + v + "'; allowed: "
                    + GridGeometry.allowed());
        }
    }

    /**
     * Samples a field on a uniform Cartesian grid and writes it in this layout, with Φ when the
     * field has E.
     *
     * @param lo    the grid's lower corner (m)
     * @param hi    its upper corner (m)
     * @param nodes nodes per axis (at least 4)
     */
    public static void write(Field f, double[] lo, double[] hi, int[] nodes, Path file) {
        write(f, lo, hi, nodes, null, file);
    }

    /**
     * As {@link #write(Field, double[], double[], int[], Path)}, with a wall polygon in (R, Z)
     * (R = √(x² + y²)), or none when wall is null.
     */
    public static void write(Field f, double[] lo, double[] hi, int[] nodes, WallPolygon wall, Path file) {
        double[][] axes = new double[3][];
        for (int a = 0; a < 3; a++) {
            axes[a] = nodes(lo[a], hi[a], nodes[a]);
        }
        staticWithPotential(f);
        double[][][][] b = new double[3][nodes[0]][nodes[1]][nodes[2]];
        double[][][] pot = new double[nodes[0]][nodes[1]][nodes[2]];
        FieldSample s = new FieldSample();
        for (int i = 0; i < nodes[0]; i++) {
            for (int j = 0; j < nodes[1]; j++) {
                for (int k = 0; k < nodes[2]; k++) {
                    f.evaluate(0, axes[0][i], axes[1][j], axes[2][k], s);
                    b[0][i][j][k] = s.bx;
                    b[1][i][j][k] = s.by;
                    b[2][i][j][k] = s.bz;
                    pot[i][j][k] = f.potential(0, axes[0][i], axes[1][j], axes[2][k]);
                }
            }
        }
        writeVolume(file, GridGeometry.CARTESIAN, new String[] {"x_m", "y_m", "z_m"}, new String[] {"m", "m", "m"},
                axes, new String[] {"bx_t", "by_t", "bz_t"}, b, f.hasElectricField() ? pot : null, f.length(), wall);
    }

    /** Writes a three-dimensional grid: its axes, the B components, Φ if given (else null), L and the wall. */
    private static void writeVolume(Path file, GridGeometry geometry, String[] axisNames, String[] axisUnits,
                                    double[][] axes, String[] bNames, double[][][][] b, double[][][] pot, double length,
                                    WallPolygon wall) {
        try (WritableHdfFile out = HdfFile.write(file)) {
            out.putAttribute(GEOMETRY, geometry.key());
            if (pot != null) {
                put(out, POTENTIAL, pot, "V");
            }
            for (int a = 0; a < 3; a++) {
                put(out, axisNames[a], axes[a], axisUnits[a]);
            }
            for (int c = 0; c < 3; c++) {
                put(out, bNames[c], b[c], "T");
            }
            put(out, "length_m", new double[] {length}, "m");
            putWall(out, wall);
        }
    }

    /**
     * Samples a field on a uniform cylindrical grid, φ over one full turn, and writes it in this
     * layout, with Φ when the field has E.
     *
     * @param rLo  smallest R (m), &gt; 0
     * @param rHi  largest R (m)
     * @param zLo  smallest Z (m)
     * @param zHi  largest Z (m)
     * @param nR   R nodes (at least 4)
     * @param nPhi φ nodes (at least 4), spaced 2π/nPhi from φ = 0
     * @param nZ   Z nodes (at least 4)
     */
    public static void writeCylindrical(Field f, double rLo, double rHi, double zLo, double zHi, int nR, int nPhi,
                                        int nZ, Path file) {
        writeCylindrical(f, rLo, rHi, zLo, zHi, nR, nPhi, nZ, null, file);
    }

    /** As {@link #writeCylindrical(Field, double, double, double, double, int, int, int, Path)}, with a wall or none (null). */
    public static void writeCylindrical(Field f, double rLo, double rHi, double zLo, double zHi, int nR, int nPhi,
                                        int nZ, WallPolygon wall, Path file) {
        double[] r = nodes(rLo, rHi, nR);
        double[] z = nodes(zLo, zHi, nZ);
        double[] phi = new double[nPhi];
        for (int j = 0; j < nPhi; j++) {
            phi[j] = 2 * Math.PI * j / nPhi;
        }
        staticWithPotential(f);
        double[][][][] b = new double[3][nR][nPhi][nZ];
        double[][][] pot = new double[nR][nPhi][nZ];
        double[] c = new double[3];
        for (int i = 0; i < nR; i++) {
            for (int j = 0; j < nPhi; j++) {
                for (int k = 0; k < nZ; k++) {
                    cylindrical(f, r[i], phi[j], z[k], c);
                    b[0][i][j][k] = c[0];
                    b[1][i][j][k] = c[1];
                    b[2][i][j][k] = c[2];
                    pot[i][j][k] = f.potential(0, r[i] * Math.cos(phi[j]), r[i] * Math.sin(phi[j]), z[k]);
                }
            }
        }
        writeVolume(file, GridGeometry.CYLINDRICAL, new String[] {"r_m", "phi_rad", "z_m"}, new String[] {"m", "rad", "m"},
                new double[][] {r, phi, z}, new String[] {"br_t", "bphi_t", "bz_t"}, b,
                f.hasElectricField() ? pot : null, f.length(), wall);
    }

    /**
     * Samples an axisymmetric field on a uniform (R, Z) grid at φ = 0 and writes it in this layout,
     * with Φ when the field has E.
     *
     * @param rLo smallest R (m), &gt; 0
     * @param rHi largest R (m)
     * @param zLo smallest Z (m)
     * @param zHi largest Z (m)
     * @param nR  R nodes (at least 4)
     * @param nZ  Z nodes (at least 4)
     * @throws FieldParameterException when the field's cylindrical components at φ = 1 rad differ
     *                                 from those at φ = 0 (it is not axisymmetric about the z axis)
     */
    public static void writeAxisymmetric(Field f, double rLo, double rHi, double zLo, double zHi, int nR, int nZ,
                                         Path file) {
        writeAxisymmetric(f, rLo, rHi, zLo, zHi, nR, nZ, null, file);
    }

    /** As {@link #writeAxisymmetric(Field, double, double, double, double, int, int, Path)}, with a wall or none (null). */
    public static void writeAxisymmetric(Field f, double rLo, double rHi, double zLo, double zHi, int nR, int nZ,
                                         WallPolygon wall, Path file) {
        double[] r = nodes(rLo, rHi, nR);
        double[] z = nodes(zLo, zHi, nZ);
        staticWithPotential(f);
        double[][][] b = new double[3][nR][nZ];
        double[][] pot = new double[nR][nZ];
        double[] c = new double[3];
        double[] turned = new double[3];
        double worst = 0, scale = 0;
        for (int i = 0; i < nR; i++) {
            for (int k = 0; k < nZ; k++) {
                cylindrical(f, r[i], 0, z[k], c);
                cylindrical(f, r[i], 1, z[k], turned);
                for (int m = 0; m < 3; m++) {
                    b[m][i][k] = c[m];
                    worst = Math.max(worst, Math.abs(c[m] - turned[m]));
                    scale = Math.max(scale, Math.abs(c[m]));
                }
                pot[i][k] = f.potential(0, r[i], 0, z[k]);
                double potTurned = f.potential(0, r[i] * Math.cos(1), r[i] * Math.sin(1), z[k]);
                if (Math.abs(pot[i][k] - potTurned) > 1e-9 * Math.max(Math.abs(pot[i][k]), Math.abs(potTurned))) {
                    throw new FieldParameterException("field " + f.name() + " is not axisymmetric about the z axis "
                            + "(Phi changes between phi = 0 and 1 rad); use the cylindrical or cartesian geometry");
                }
            }
        }
        if (worst > 1e-9 * scale) {
            throw new FieldParameterException("field " + f.name() + " is not axisymmetric about the z axis (B_R, B_phi, "
                    + "B_Z change by up to " + worst + " T between phi = 0 and 1 rad); use the cylindrical or cartesian "
                    + "geometry");
        }
        try (WritableHdfFile out = HdfFile.write(file)) {
            out.putAttribute(GEOMETRY, GridGeometry.AXISYMMETRIC.key());
            if (f.hasElectricField()) {
                put(out, POTENTIAL, pot, "V");
            }
            put(out, "r_m", r, "m");
            put(out, "z_m", z, "m");
            put(out, "br_t", b[0], "T");
            put(out, "bphi_t", b[1], "T");
            put(out, "bz_t", b[2], "T");
            put(out, "length_m", new double[] {f.length()}, "m");
            putWall(out, wall);
        }
    }

    /** @throws FieldParameterException unless f is static and its E, if any, has a potential */
    private static void staticWithPotential(Field f) {
        if (!f.isStatic() || (f.hasElectricField() && !f.hasPotential())) {
            throw new FieldParameterException("field " + f.name() + " is not static with E = -grad Phi; a grid file "
                    + "holds a static B and optionally Phi");
        }
    }

    /** B_R, B_φ, B_Z (T) of f at (R, φ, Z) into out. */
    private static void cylindrical(Field f, double r, double phi, double z, double[] out) {
        FieldSample s = new FieldSample();
        double c = Math.cos(phi), sn = Math.sin(phi);
        f.evaluate(0, r * c, r * sn, z, s);
        out[0] = c * s.bx + sn * s.by;
        out[1] = -sn * s.bx + c * s.by;
        out[2] = s.bz;
    }

    private static double[] nodes(double lo, double hi, int n) {
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = lo + (hi - lo) * i / (n - 1);
        }
        return a;
    }

    private static void putWall(WritableHdfFile out, WallPolygon wall) {
        if (wall != null) {
            double[] r = new double[wall.size()], z = new double[wall.size()];
            for (int i = 0; i < r.length; i++) {
                r[i] = wall.r(i);
                z[i] = wall.z(i);
            }
            put(out, WALL_R, r, "m");
            put(out, WALL_Z, z, "m");
        }
    }

    private static void put(WritableHdfFile out, String name, Object data, String unit) {
        WritableDataset d = out.putDataset(name, data);
        d.putAttribute(UNIT, unit);
    }

    private static double length(HdfFile h, String where) {
        double[] l = vector(h, "length_m", "m", where);
        if (l.length != 1 || !(l[0] > 0)) {
            throw new FieldParameterException(where + ": /length_m must hold one length > 0 m");
        }
        return l[0];
    }

    /** A uniform, increasing axis of at least 4 nodes. */
    private static double[] axis(HdfFile h, String name, String unit, String where) {
        double[] a = vector(h, name, unit, where);
        if (a.length < 4) {
            throw new FieldParameterException(where + ": /" + name + " has " + a.length
                    + " nodes; the interpolation needs at least 4");
        }
        double step = (a[a.length - 1] - a[0]) / (a.length - 1);
        for (int i = 0; i < a.length; i++) {
            if (!(Math.abs(a[i] - (a[0] + i * step)) <= 1e-9 * Math.abs(step)) || !(step > 0)) {
                throw new FieldParameterException(where + ": /" + name + " is not uniform and increasing "
                        + "(node " + i + " at " + a[i] + " " + unit + ")");
            }
        }
        return a;
    }

    private static double[] radius(HdfFile h, String where) {
        double[] r = axis(h, "r_m", "m", where);
        if (!(r[0] > 0)) {
            throw new FieldParameterException(where + ": /r_m must be > 0 at every node (R = 0 is the axis, where the "
                    + "cylindrical basis is singular); its first node is at " + r[0] + " m");
        }
        return r;
    }

    private static double[] turn(HdfFile h, String where) {
        double[] p = axis(h, "phi_rad", "rad", where);
        double step = 2 * Math.PI / p.length;
        for (int j = 0; j < p.length; j++) {
            if (!(Math.abs(p[j] - (p[0] + j * step)) <= 1e-9)) {
                throw new FieldParameterException(where + ": /phi_rad must cover one full turn, " + p.length
                        + " nodes spaced 2 pi/" + p.length + " rad (node " + j + " at " + p[j] + " rad)");
            }
        }
        return p;
    }

    private static double[] vector(HdfFile h, String name, String unit, String where) {
        Object d = data(h, name, unit, where);
        if (!(d instanceof double[] v)) {
            throw new FieldParameterException(where + ": /" + name + " must be a 1-D array of 64-bit floats");
        }
        for (double x : v) {
            if (!Double.isFinite(x)) {
                throw new FieldParameterException(where + ": /" + name + " holds a value that is not finite");
            }
        }
        return v;
    }

    private static double[][][] cube(HdfFile h, String name, String unit, String where, int n0, int n1, int n2) {
        Object d = data(h, name, unit, where);
        if (!(d instanceof double[][][] v) || v.length != n0 || v[0].length != n1 || v[0][0].length != n2) {
            throw new FieldParameterException(where + ": /" + name + " must be a " + n0 + " x " + n1 + " x " + n2
                    + " array of 64-bit floats (the grid's nodes)");
        }
        for (double[][] a : v) {
            finite(a, name, where);
        }
        return v;
    }

    private static double[][] square(HdfFile h, String name, String unit, String where, int n0, int n1) {
        Object d = data(h, name, unit, where);
        if (!(d instanceof double[][] v) || v.length != n0 || v[0].length != n1) {
            throw new FieldParameterException(where + ": /" + name + " must be a " + n0 + " x " + n1
                    + " array of 64-bit floats (the grid's R, Z nodes)");
        }
        finite(v, name, where);
        return v;
    }

    private static void finite(double[][] a, String name, String where) {
        for (double[] r : a) {
            for (double x : r) {
                if (!Double.isFinite(x)) {
                    throw new FieldParameterException(where + ": /" + name + " holds a value that is not finite");
                }
            }
        }
    }

    private static Object data(HdfFile h, String name, String unit, String where) {
        Dataset d;
        try {
            d = h.getDatasetByPath("/" + name);
        } catch (RuntimeException e) {
            throw new FieldParameterException(where + ": dataset /" + name + " is missing");
        }
        Attribute u = d.getAttribute(UNIT);
        if (u != null && !unit.equals(String.valueOf(u.getData()).trim())) {
            throw new FieldParameterException(where + ": /" + name + " has unit '" + u.getData() + "'; it must be "
                    + unit);
        }
        return d.getData();
    }
}
