package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * Gridded fields against the analytic field they sample. Tricubic Hermite interpolation with
 * central-difference nodal derivatives errs by O(h³) in the value and O(h²) in the first
 * derivatives (the derivatives' O(h²) error sets both; Lekien &amp; Marsden, Int. J. Numer. Meth.
 * Eng. 63, 2005, for the interpolant; the difference error is common practice), so halving the
 * spacing must cut the B error by at least 2^2.6 and the Jacobian error by 2^1.6. The
 * interpolant of the vacuum toroidal field stays divergence-free to the same order. Files that
 * are not a grid are refused with the problem named: 16 malformed HDF5 files in all, and 4 more
 * with a malformed wall polygon.
 */
class GridFieldTest {

    @TempDir
    Path tmp;

    private static final double[] LO = {0.7, -0.3, -0.3};
    private static final double[] HI = {1.3, 0.3, 0.3};

    private GriddedField grid(Field f, int nodes, String name) {
        Path file = tmp.resolve(name);
        GridFile.write(f, LO, HI, new int[] {nodes, nodes, nodes}, file);
        return GridFile.read(file);
    }

    /** Largest errors of B and of its Jacobian (relative to |B| and |B|/R0) over random interior points. */
    private static double[] errors(Field exact, Field g) {
        Random rnd = new Random(7);
        FieldSample a = new FieldSample();
        FieldSample b = new FieldSample();
        double eb = 0, ej = 0, div = 0;
        for (int n = 0; n < 300; n++) {
            double x = 0.8 + 0.4 * rnd.nextDouble();
            double y = -0.2 + 0.4 * rnd.nextDouble();
            double z = -0.2 + 0.4 * rnd.nextDouble();
            exact.evaluate(0, x, y, z, a);
            g.evaluate(0, x, y, z, b);
            eb = Math.max(eb, Math.hypot(Math.hypot(a.bx - b.bx, a.by - b.by), a.bz - b.bz) / a.bMag());
            for (int i = 0; i < 9; i++) {
                ej = Math.max(ej, Math.abs(a.dB[i] - b.dB[i]) / a.bMag());
            }
            div = Math.max(div, Math.abs(b.divB()) / a.bMag());
        }
        return new double[] {eb, ej, div};
    }

    @Test
    void interpolationConvergesAtItsOrder() {
        Field toroidal = Fields.create("toroidal", Species.PROTON);
        double[] coarse = errors(toroidal, grid(toroidal, 13, "c.h5"));
        double[] fine = errors(toroidal, grid(toroidal, 25, "f.h5"));
        assertTrue(coarse[0] / fine[0] > Math.pow(2, 2.6), "B: " + coarse[0] + " -> " + fine[0]);
        assertTrue(coarse[1] / fine[1] > Math.pow(2, 1.6), "Jacobian: " + coarse[1] + " -> " + fine[1]);
        assertTrue(fine[0] < 1e-4, "B error " + fine[0]);
        assertTrue(fine[2] < 10 * fine[1], "div B " + fine[2] + " against the Jacobian error " + fine[1]);
    }

    @Test
    void theGridIsTheDomainAndLIsTheFilesOwn() {
        Field toroidal = Fields.create("toroidal", Species.PROTON);
        GriddedField g = grid(toroidal, 8, "g.h5");
        assertTrue(g.inDomain(1.0, 0.0, 0.0));
        assertTrue(!g.inDomain(1.31, 0.0, 0.0) && !g.inDomain(1.0, 0.0, -0.31));
        assertEquals(toroidal.length(), g.length(), 0.0);
    }

    private Path bad(String name, java.util.function.Consumer<WritableHdfFile> content) {
        Path p = tmp.resolve(name);
        try (WritableHdfFile f = HdfFile.write(p)) {
            content.accept(f);
        }
        return p;
    }

    private static void refused(Path file, String expected) {
        FieldParameterException e = assertThrows(FieldParameterException.class, () -> GridFile.read(file));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }

    @Test
    void filesThatAreNotGridsAreRefused() throws IOException {
        double[] axis = {0, 1, 2, 3};
        double[][][] cube = new double[4][4][4];
        refused(tmp.resolve("none.h5"), "no such file");
        Path text = tmp.resolve("text.h5");
        Files.writeString(text, "x_m,y_m\n");
        refused(text, "not a readable grid file");
        refused(bad("missing.h5", f -> {
            f.putDataset("x_m", axis);
            f.putDataset("y_m", axis);
        }), "dataset /z_m is missing");
        refused(bad("short.h5", f -> {
            f.putDataset("x_m", new double[] {0, 1, 2});
            f.putDataset("y_m", axis);
            f.putDataset("z_m", axis);
        }), "at least 4");
        refused(bad("uneven.h5", f -> {
            f.putDataset("x_m", new double[] {0, 1, 2.5, 3});
            f.putDataset("y_m", axis);
            f.putDataset("z_m", axis);
        }), "is not uniform");
        refused(bad("shape.h5", f -> {
            f.putDataset("x_m", axis);
            f.putDataset("y_m", axis);
            f.putDataset("z_m", axis);
            f.putDataset("bx_t", new double[4][4][3]);
        }), "must be a 4 x 4 x 4 array");
        double[][][] nan = new double[4][4][4];
        nan[1][2][3] = Double.NaN;
        refused(bad("nan.h5", f -> {
            f.putDataset("x_m", axis);
            f.putDataset("y_m", axis);
            f.putDataset("z_m", axis);
            f.putDataset("bx_t", nan);
        }), "not finite");
        refused(bad("length.h5", f -> {
            f.putDataset("x_m", axis);
            f.putDataset("y_m", axis);
            f.putDataset("z_m", axis);
            f.putDataset("bx_t", cube);
            f.putDataset("by_t", cube);
            f.putDataset("bz_t", cube);
            f.putDataset("length_m", new double[] {-1});
        }), "/length_m must hold one length > 0 m");
    }

    /** A cylindrical or axisymmetric file's datasets, one of them replaced or dropped by {@code change}. */
    private Path curvilinear(String name, String geometry, java.util.Map<String, Object> change) {
        double[] r = {0.5, 0.6, 0.7, 0.8};
        double[] phi = {0, Math.PI / 2, Math.PI, 3 * Math.PI / 2};
        double[] z = {-0.1, 0, 0.1, 0.2};
        boolean axi = geometry.equals("axisymmetric");
        Object b = axi ? new double[4][4] : new double[4][4][4];
        java.util.Map<String, Object> sets = new java.util.LinkedHashMap<>();
        sets.put("r_m", r);
        if (!axi) {
            sets.put("phi_rad", phi);
        }
        sets.put("z_m", z);
        sets.put("br_t", b);
        sets.put("bphi_t", b);
        sets.put("bz_t", b);
        sets.put("length_m", new double[] {1});
        sets.putAll(change);
        return bad(name, f -> {
            f.putAttribute("geometry", geometry);
            sets.forEach((k, v) -> {
                if (v != null) {
                    f.putDataset(k, v);
                }
            });
        });
    }

    /**
     * The curvilinear half of the corpus: 10 more malformed HDF5 files (16 with the 6 above), each
     * refused with the dataset or attribute named; a well-formed one of each geometry reads.
     */
    @Test
    void curvilinearFilesThatAreNotGridsAreRefused() {
        java.util.Map<String, Object> none = java.util.Map.of();
        assertEquals(GridGeometry.CYLINDRICAL, GridFile.read(curvilinear("ok-cyl.h5", "cylindrical", none)).geometry());
        assertEquals(GridGeometry.AXISYMMETRIC, GridFile.read(curvilinear("ok-axi.h5", "axisymmetric", none)).geometry());
        refused(curvilinear("geometry.h5", "toroidal", none), "root attribute 'geometry' is 'toroidal'; allowed: "
                + "cartesian, cylindrical, axisymmetric");
        java.util.Map<String, Object> noR = new java.util.HashMap<>();
        noR.put("r_m", null);
        refused(curvilinear("no-r.h5", "axisymmetric", noR), "dataset /r_m is missing");
        refused(curvilinear("r-order.h5", "cylindrical", java.util.Map.of("r_m", new double[] {0.5, 0.7, 0.6, 0.8})),
                "/r_m is not uniform and increasing");
        refused(curvilinear("r-axis.h5", "axisymmetric", java.util.Map.of("r_m", new double[] {-0.1, 0, 0.1, 0.2})),
                "/r_m must be > 0 at every node");
        refused(curvilinear("phi-turn.h5", "cylindrical", java.util.Map.of("phi_rad", new double[] {0, 0.1, 0.2, 0.3})),
                "/phi_rad must cover one full turn");
        refused(curvilinear("cyl-shape.h5", "cylindrical", java.util.Map.of("bphi_t", new double[4][3][4])),
                "/bphi_t must be a 4 x 4 x 4 array");
        refused(curvilinear("axi-shape.h5", "axisymmetric", java.util.Map.of("br_t", new double[4][4][4])),
                "/br_t must be a 4 x 4 array");
        double[][] nan = new double[4][4];
        nan[2][1] = Double.NaN;
        refused(curvilinear("axi-nan.h5", "axisymmetric", java.util.Map.of("bz_t", nan)), "/bz_t holds a value that is not finite");
        Path unit = bad("unit.h5", f -> {
            f.putAttribute("geometry", "axisymmetric");
            f.putDataset("r_m", new double[] {50, 60, 70, 80}).putAttribute("unit", "cm");
        });
        refused(unit, "/r_m has unit 'cm'; it must be m");
        refused(curvilinear("phi-shape.h5", "axisymmetric", java.util.Map.of("phi_v", new double[4][3])),
                "/phi_v must be a 4 x 4 array");
    }

    /**
     * The optional wall: R = √(x² + y²), Z = z on a cartesian grid, margin the smaller of the box's
     * and the wall's signed distance; the domain text names it. A file written without a wall is
     * the grid box alone, as before.
     */
    @Test
    void aWallCutsTheDomainInEveryGeometry() {
        Field toroidal = Fields.create("toroidal", Species.PROTON);
        WallPolygon wall = new WallPolygon(new double[] {0.8, 1.2, 1.2, 0.8}, new double[] {-0.2, -0.2, 0.1, 0.1});
        Path cart = tmp.resolve("walled.h5");
        GridFile.write(toroidal, LO, HI, new int[] {8, 8, 8}, wall, cart);
        GriddedField g = GridFile.read(cart);
        // at x = 0.99, R = 1: 0.05 m below the wall's top edge Z = 0.1, at least 0.15 m inside the box
        double y = Math.sqrt(1 - 0.99 * 0.99);
        assertEquals(0.05, g.domainMargin(0.99, y, 0.05), 1e-12);
        assertEquals(-0.05, g.domainMargin(0.99, y, 0.15), 1e-12);
        assertTrue(g.domainMeaning().contains("wall polygon of 4 corners"), g.domainMeaning());
        Path axi = tmp.resolve("walled-rz.h5");
        GridFile.writeAxisymmetric(toroidal, 0.7, 1.3, -0.3, 0.3, 6, 6, wall, axi);
        GriddedField a = GridFile.read(axi);
        assertEquals(0.1, a.domainMargin(0, 1.0, 0), 1e-12);
        assertTrue(!a.inDomain(1.25, 0, 0) && a.inDomain(1.15, 0, 0));
        assertEquals(grid(toroidal, 8, "plain.h5").domainMeaning(), "the grid box; a particle leaving it is lost");
    }

    @Test
    void malformedWallsAreRefused() {
        double[] r = {0.55, 0.75, 0.65};
        double[] z = {-0.05, -0.05, 0.15};
        refused(curvilinear("wall-lengths.h5", "axisymmetric",
                java.util.Map.of("wall_r_m", r, "wall_z_m", new double[] {0, 0.1})),
                "/wall_r_m has 3 corners and /wall_z_m has 2");
        refused(curvilinear("wall-two.h5", "cylindrical",
                java.util.Map.of("wall_r_m", new double[] {0.6, 0.7}, "wall_z_m", new double[] {0, 0.1})),
                "hold 2 distinct corners; the wall polygon needs at least 3");
        refused(curvilinear("wall-nan.h5", "axisymmetric",
                java.util.Map.of("wall_r_m", r, "wall_z_m", new double[] {0, Double.NaN, 0.1})),
                "/wall_z_m holds a value that is not finite");
        refused(curvilinear("wall-alone.h5", "axisymmetric", java.util.Map.of("wall_r_m", r)),
                "dataset /wall_z_m is missing");
        Path unit = bad("wall-unit.h5", f -> {
            f.putAttribute("geometry", "axisymmetric");
            f.putDataset("r_m", new double[] {0.5, 0.6, 0.7, 0.8});
            f.putDataset("z_m", new double[] {-0.1, 0, 0.1, 0.2});
            for (String b : new String[] {"br_t", "bphi_t", "bz_t"}) {
                f.putDataset(b, new double[4][4]);
            }
            f.putDataset("length_m", new double[] {1});
            f.putDataset("wall_r_m", new double[] {55, 75, 65}).putAttribute("unit", "cm");
            f.putDataset("wall_z_m", z);
        });
        refused(unit, "/wall_r_m has unit 'cm'; it must be m");
    }
}
