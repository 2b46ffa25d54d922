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

    @Option(names = "--out", paramLabel = "FILE", required = true, description = "The grid file to write (.h5).")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        GridSpec grid = GridSpec.parse(geometry, box, nodes);
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
            grid.write(f, out);
        } catch (FieldParameterException e) {
            throw new BadInputException("--geometry: " + e.getMessage());
        }
        GriddedField g = GridFile.read(out);
        PrintWriter pw = spec.commandLine().getOut();
        pw.println("wrote " + out + ": " + field + " on the " + g.gridSummary());
        pw.println(g.divergenceSummary() + " (L = " + Format.number(g.length()) + " m)");
        pw.println("use it as --field grid:" + out);
        pw.flush();
        return 0;
    }
}
