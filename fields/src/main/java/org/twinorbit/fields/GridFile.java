package org.twinorbit.fields;

import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import io.jhdf.api.Dataset;
import java.nio.file.Files;
import java.nio.file.Path;
import org.twinorbit.shared.FieldSample;

/**
 * Gridded fields in an HDF5 layout of our own, read and written with the pure-Java jHDF library.
 * All datasets are 64-bit floats:
 * <pre>
 * /x_m, /y_m, /z_m      the grid coordinates (m), uniform, at least 4 nodes each
 * /bx_t, /by_t, /bz_t   B (T) at the nodes, [nx][ny][nz]
 * /length_m             [1]: the length L (m) that defines ε = ρ0/L
 * </pre>
 * A field of the library is named {@code grid:PATH} to load one ({@link Fields#create}).
 */
public final class GridFile {

    /** The prefix of a field name that names a grid file. */
    public static final String PREFIX = "grid:";

    private GridFile() {}

    /** @throws FieldParameterException naming the file and what is wrong with it */
    public static GridField read(Path file) {
        String where = "field " + PREFIX + file;
        if (!Files.isRegularFile(file)) {
            throw new FieldParameterException(where + ": no such file");
        }
        try (HdfFile h = new HdfFile(file)) {
            double[][] axes = new double[3][];
            String[] names = {"x_m", "y_m", "z_m"};
            for (int a = 0; a < 3; a++) {
                axes[a] = vector(h, names[a], where);
                if (axes[a].length < 4) {
                    throw new FieldParameterException(where + ": /" + names[a] + " has " + axes[a].length
                            + " nodes; the interpolation needs at least 4");
                }
                double step = (axes[a][axes[a].length - 1] - axes[a][0]) / (axes[a].length - 1);
                for (int i = 0; i < axes[a].length; i++) {
                    if (!(Math.abs(axes[a][i] - (axes[a][0] + i * step)) <= 1e-9 * Math.abs(step)) || !(step > 0)) {
                        throw new FieldParameterException(where + ": /" + names[a] + " is not uniform and increasing "
                                + "(node " + i + " at " + axes[a][i] + " m)");
                    }
                }
            }
            double[][][][] b = new double[3][][][];
            String[] bn = {"bx_t", "by_t", "bz_t"};
            for (int c = 0; c < 3; c++) {
                b[c] = cube(h, bn[c], where, axes[0].length, axes[1].length, axes[2].length);
            }
            double[] l = vector(h, "length_m", where);
            if (l.length != 1 || !(l[0] > 0) || !Double.isFinite(l[0])) {
                throw new FieldParameterException(where + ": /length_m must hold one length > 0 m");
            }
            return new GridField(PREFIX + file, axes, b, l[0], "L from the grid file (/length_m)");
        } catch (FieldParameterException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new FieldParameterException(where + ": not a readable grid file (" + e.getMessage() + ")");
        }
    }

    /**
     * Samples a field on a uniform grid and writes it in this layout.
     *
     * @param lo    the grid's lower corner (m)
     * @param hi    its upper corner (m)
     * @param nodes nodes per axis (at least 4)
     */
    public static void write(Field f, double[] lo, double[] hi, int[] nodes, Path file) {
        double[][] axes = new double[3][];
        for (int a = 0; a < 3; a++) {
            axes[a] = new double[nodes[a]];
            for (int i = 0; i < nodes[a]; i++) {
                axes[a][i] = lo[a] + (hi[a] - lo[a]) * i / (nodes[a] - 1);
            }
        }
        double[][][][] b = new double[3][nodes[0]][nodes[1]][nodes[2]];
        FieldSample s = new FieldSample();
        for (int i = 0; i < nodes[0]; i++) {
            for (int j = 0; j < nodes[1]; j++) {
                for (int k = 0; k < nodes[2]; k++) {
                    f.evaluate(0, axes[0][i], axes[1][j], axes[2][k], s);
                    b[0][i][j][k] = s.bx;
                    b[1][i][j][k] = s.by;
                    b[2][i][j][k] = s.bz;
                }
            }
        }
        try (WritableHdfFile out = HdfFile.write(file)) {
            out.putDataset("x_m", axes[0]);
            out.putDataset("y_m", axes[1]);
            out.putDataset("z_m", axes[2]);
            out.putDataset("bx_t", b[0]);
            out.putDataset("by_t", b[1]);
            out.putDataset("bz_t", b[2]);
            out.putDataset("length_m", new double[] {f.length()});
        }
    }

    private static double[] vector(HdfFile h, String name, String where) {
        Object d = data(h, name, where);
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

    private static double[][][] cube(HdfFile h, String name, String where, int nx, int ny, int nz) {
        Object d = data(h, name, where);
        if (!(d instanceof double[][][] v) || v.length != nx || v[0].length != ny || v[0][0].length != nz) {
            throw new FieldParameterException(where + ": /" + name + " must be a " + nx + " x " + ny + " x " + nz
                    + " array of 64-bit floats (the grid's nodes)");
        }
        for (double[][] a : v) {
            for (double[] r : a) {
                for (double x : r) {
                    if (!Double.isFinite(x)) {
                        throw new FieldParameterException(where + ": /" + name + " holds a value that is not finite");
                    }
                }
            }
        }
        return v;
    }

    private static Object data(HdfFile h, String name, String where) {
        Dataset d;
        try {
            d = h.getDatasetByPath("/" + name);
        } catch (RuntimeException e) {
            throw new FieldParameterException(where + ": dataset /" + name + " is missing");
        }
        return d.getData();
    }
}
