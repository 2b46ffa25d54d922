package org.twinorbit.harness.gridstudy;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.GridFile;
import org.twinorbit.fields.WallPolygon;
import org.twinorbit.fields.GridGeometry;
import org.twinorbit.harness.BadInputException;

/**
 * Where and how finely a field is sampled onto a grid file: the geometry, the box and the nodes
 * per axis, checked as the user gave them ({@code --geometry}, {@code --box}, {@code --nodes}).
 *
 * @param geometry the coordinate system
 * @param box      cartesian: x0, x1, y0, y1, z0, z1 (m); cylindrical and axisymmetric: R0, R1, Z0, Z1 (m)
 * @param nodes    cartesian: nx, ny, nz; cylindrical: nR, nφ, nZ; axisymmetric: nR, nZ
 */
public record GridSpec(GridGeometry geometry, double[] box, int[] nodes) {

    /** The {@code --box} help text. */
    public static final String BOX_HELP = "The grid box (m): X0,X1,Y0,Y1,Z0,Z1 for cartesian; R0,R1,Z0,Z1 (R0 > 0) for "
            + "cylindrical and axisymmetric.";
    /** The {@code --nodes} help text. */
    public static final String NODES_HELP = "Nodes per axis, at least 4 each: NX,NY,NZ for cartesian; NR,NPHI,NZ for "
            + "cylindrical (phi over one full turn); NR,NZ for axisymmetric.";
    /** The {@code --geometry} help text. */
    public static final String GEOMETRY_HELP = "Grid geometry: cartesian (B_x, B_y, B_z on x, y, z; tricubic), "
            + "cylindrical (B_R, B_phi, B_Z on R, phi, Z; tricubic, phi periodic) or axisymmetric (B_R, B_phi, B_Z on "
            + "R, Z; bicubic; the field must not depend on phi) (default: cartesian).";

    /** @throws BadInputException naming the option and what it allows */
    public static GridSpec parse(String geometry, List<Double> box, List<Integer> nodes) {
        GridGeometry g;
        try {
            g = GridGeometry.parse(geometry);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--geometry: " + e.getMessage());
        }
        boolean cart = g == GridGeometry.CARTESIAN;
        int boxCount = cart ? 6 : 4;
        int nodeCount = g == GridGeometry.AXISYMMETRIC ? 2 : 3;
        if (box.size() != boxCount) {
            throw new BadInputException("--box: the " + g.key() + " grid takes " + (cart ? "X0,X1,Y0,Y1,Z0,Z1" : "R0,R1,Z0,Z1")
                    + " (m), got " + box.size() + " numbers");
        }
        double[] b = box.stream().mapToDouble(Double::doubleValue).toArray();
        for (int i = 0; i < b.length; i += 2) {
            if (!(b[i + 1] > b[i]) || !Double.isFinite(b[i]) || !Double.isFinite(b[i + 1])) {
                throw new BadInputException("--box: each upper bound must exceed its lower bound, got " + box);
            }
        }
        if (!cart && !(b[0] > 0)) {
            throw new BadInputException("--box: R0 must be > 0 (R = 0 is the axis, where the cylindrical basis is "
                    + "singular), got " + b[0]);
        }
        String names = cart ? "NX,NY,NZ" : g == GridGeometry.CYLINDRICAL ? "NR,NPHI,NZ" : "NR,NZ";
        if (nodes.size() != nodeCount || nodes.stream().anyMatch(n -> n < 4 || n > 1000)) {
            throw new BadInputException("--nodes: the " + g.key() + " grid takes " + names + ", each in [4, 1000], got "
                    + nodes);
        }
        return new GridSpec(g, b, nodes.stream().mapToInt(Integer::intValue).toArray());
    }

    /** The same box with every cell cut into {@code factor} along each axis. */
    public GridSpec refined(int factor) {
        int[] n = new int[nodes.length];
        for (int a = 0; a < n.length; a++) {
            boolean periodic = geometry == GridGeometry.CYLINDRICAL && a == 1;
            n[a] = periodic ? nodes[a] * factor : (nodes[a] - 1) * factor + 1;
        }
        return new GridSpec(geometry, box, n);
    }

    /**
     * The largest node spacing (m); along φ it is the arc between nodes at the largest R.
     */
    public double spacing() {
        double h = 0;
        if (geometry == GridGeometry.CARTESIAN) {
            for (int a = 0; a < 3; a++) {
                h = Math.max(h, (box[2 * a + 1] - box[2 * a]) / (nodes[a] - 1));
            }
            return h;
        }
        int nz = nodes[nodes.length - 1];
        h = Math.max((box[1] - box[0]) / (nodes[0] - 1), (box[3] - box[2]) / (nz - 1));
        if (geometry == GridGeometry.CYLINDRICAL) {
            h = Math.max(h, box[1] * 2 * Math.PI / nodes[1]);
        }
        return h;
    }

    /** The nodes as text, e.g. {@code 17 x 33}. */
    public String nodesText() {
        StringBuilder sb = new StringBuilder();
        for (int n : nodes) {
            sb.append(sb.length() == 0 ? "" : " x ").append(n);
        }
        return sb.toString();
    }

    /** Samples the field on this grid and writes the grid file. */
    public void write(Field f, Path file) {
        write(f, null, file);
    }

    /** Samples the field on this grid and writes the grid file with a wall polygon in (R, Z), or none (null). */
    public void write(Field f, WallPolygon wall, Path file) {
        switch (geometry) {
            case CARTESIAN -> GridFile.write(f, new double[] {box[0], box[2], box[4]}, new double[] {box[1], box[3], box[5]},
                    nodes, wall, file);
            case CYLINDRICAL -> GridFile.writeCylindrical(f, box[0], box[1], box[2], box[3], nodes[0], nodes[1], nodes[2],
                    wall, file);
            default -> GridFile.writeAxisymmetric(f, box[0], box[1], box[2], box[3], nodes[0], nodes[1], wall, file);
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s grid of %s nodes", geometry.key(), nodesText());
    }
}
