package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.FieldParameterException;
import org.twinorbit.fields.Fields;
import org.twinorbit.fields.GridFile;
import org.twinorbit.fields.GriddedField;
import org.twinorbit.fields.WallPolygon;
import org.twinorbit.harness.gridstudy.GridSpec;
import org.twinorbit.shared.Species;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit grid}: a field of the library sampled on a uniform cartesian, cylindrical or
 * axisymmetric grid and written as a grid file ({@link GridFile}), which {@code --field grid:FILE}
 * then reads back, interpolated; the divergence of the interpolant is printed.
 */
@Command(name = "grid", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Sample a field of the library on a uniform cartesian, cylindrical or axisymmetric grid and write "
                + "it as an HDF5 grid file, which any command reads back as --field grid:FILE (tricubic or bicubic "
                + "Hermite interpolation); prints max |div B| L/|B| of the interpolant over the cell centres.")
public final class GridCommand implements Callable<Integer> {

    @Option(names = "--field", paramLabel = "NAME", required = true, description = "Field of the library to sample.")
    String field;

    @Option(names = {"-P", "--field-param"}, paramLabel = "NAME=VALUE", description = "Override a field parameter, "
            + "in its unit (repeatable, each name once).")
    List<String> fieldParameters = new java.util.ArrayList<>();

    @Option(names = "--geometry", paramLabel = "GEOMETRY", description = GridSpec.GEOMETRY_HELP)
    String geometry = "cartesian";

    @Option(names = "--box", paramLabel = "BOUNDS", required = true, split = ",", description = GridSpec.BOX_HELP)
    List<Double> box;

    @Option(names = "--nodes", paramLabel = "COUNTS", required = true, split = ",", description = GridSpec.NODES_HELP)
    List<Integer> nodes;

    @Option(names = "--wall", paramLabel = "CORNERS", split = ",", description = "A wall polygon in (R, Z) stored in "
            + "the file: R1,Z1,R2,Z2,... (m), at least 3 corners (R = sqrt(x^2 + y^2) on a cartesian grid); a particle "
            + "crossing it is lost. Default: none, the grid alone is the domain.")
    List<Double> wall;

    @Option(names = "--out", paramLabel = "FILE", required = true, description = "The grid file to write (.h5).")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        GridSpec grid = GridSpec.parse(geometry, box, nodes);
        WallPolygon w = wall == null ? null : wall(wall);
        if (!Fields.isFile(field)) {
            try {
                Fields.provider(field);
            } catch (FieldParameterException e) {
                throw new BadInputException("--field: " + e.getMessage());
            }
        }
        Field f;
        try {
            f = Fields.create(field, OptionPairs.numbers(fieldParameters, "--field-param"), Species.PROTON);
        } catch (FieldParameterException e) {
            throw new BadInputException("--field-param: " + e.getMessage());
        }
        if (!f.isStatic() || (f.hasElectricField() && !f.hasPotential())) {
            throw new BadInputException("--field: a grid file holds a static B and optionally Phi (E = -grad Phi); '"
                    + field + "' is not such a field");
        }
        if (!Double.isFinite(f.length())) {
            throw new BadInputException("--field: '" + field + "' has no length L, which a grid file must carry");
        }
        OutputFile.check(out, "--out");
        try {
            grid.write(f, w, out);
        } catch (FieldParameterException e) {
            throw new BadInputException("--geometry: " + e.getMessage());
        }
        GriddedField g = GridFile.read(out);
        PrintWriter pw = spec.commandLine().getOut();
        pw.println("wrote " + out + ": " + field + " on the " + g.gridSummary());
        pw.println(g.divergenceSummary() + " (L = " + Format.number(g.length()) + " m)");
        if (w != null) {
            pw.println("wall: " + w.size() + " corners in (R, Z); " + g.domainMeaning());
        }
        pw.println("use it as --field grid:" + out);
        pw.flush();
        return 0;
    }

    /** The --wall corners, refused unless they are pairs of finite numbers, at least 3 distinct corners. */
    static WallPolygon wall(List<Double> v) {
        if (v.size() % 2 != 0) {
            throw new BadInputException("--wall: " + v.size() + " numbers given; it takes pairs R,Z (m), at least 3 "
                    + "corners: R1,Z1,R2,Z2,R3,Z3,...");
        }
        double[] r = new double[v.size() / 2], z = new double[v.size() / 2];
        for (int i = 0; i < r.length; i++) {
            r[i] = v.get(2 * i);
            z[i] = v.get(2 * i + 1);
            if (!Double.isFinite(r[i]) || !Double.isFinite(z[i])) {
                throw new BadInputException("--wall: corner " + (i + 1) + " is not finite; allowed: finite R,Z (m)");
            }
        }
        WallPolygon w = new WallPolygon(r, z);
        if (w.size() < 3) {
            throw new BadInputException("--wall: " + w.size() + " distinct corners given; the polygon needs at least 3 "
                    + "(R1,Z1,R2,Z2,R3,Z3,... in m)");
        }
        return w;
    }
}
