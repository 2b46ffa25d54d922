package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.FieldParameterException;
import org.twinorbit.fields.Fields;
import org.twinorbit.fields.GridFile;
import org.twinorbit.shared.Species;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit grid}: a field of the library sampled on a uniform grid and written as a grid
 * file ({@link GridFile}), which {@code --field grid:FILE} then reads back, interpolated.
 */
@Command(name = "grid", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Sample a field of the library on a uniform Cartesian grid and write it as an HDF5 grid file, "
                + "which any command reads back as --field grid:FILE (tricubic interpolation).")
public final class GridCommand implements Callable<Integer> {

    @Option(names = "--field", paramLabel = "NAME", required = true, description = "Field of the library to sample.")
    String field;

    @Option(names = {"-P", "--field-param"}, paramLabel = "NAME=VALUE", description = "Override a field parameter, "
            + "in its unit (repeatable, each name once).")
    List<String> fieldParameters = new java.util.ArrayList<>();

    @Option(names = "--box", paramLabel = "X0,X1,Y0,Y1,Z0,Z1", required = true, split = ",",
            description = "The grid box (m).")
    List<Double> box;

    @Option(names = "--nodes", paramLabel = "NX,NY,NZ", required = true, split = ",",
            description = "Nodes per axis, at least 4 each.")
    List<Integer> nodes;

    @Option(names = "--out", paramLabel = "FILE", required = true, description = "The grid file to write (.h5).")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (box.size() != 6) {
            throw new BadInputException("--box: give X0,X1,Y0,Y1,Z0,Z1 (m), got " + box.size() + " numbers");
        }
        if (nodes.size() != 3 || nodes.stream().anyMatch(n -> n < 4 || n > 1000)) {
            throw new BadInputException("--nodes: give NX,NY,NZ, each in [4, 1000], got " + nodes);
        }
        double[] lo = {box.get(0), box.get(2), box.get(4)};
        double[] hi = {box.get(1), box.get(3), box.get(5)};
        for (int a = 0; a < 3; a++) {
            if (!(hi[a] > lo[a])) {
                throw new BadInputException("--box: each upper bound must exceed its lower bound, got " + box);
            }
        }
        if (!field.startsWith(org.twinorbit.fields.GridFile.PREFIX)) {
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
        if (!f.isStatic() || f.hasElectricField()) {
            throw new BadInputException("--field: a grid file holds a static magnetic field; '" + field + "' is not one");
        }
        OutputFile.check(out, "--out");
        GridFile.write(f, lo, hi, new int[] {nodes.get(0), nodes.get(1), nodes.get(2)}, out);
        PrintWriter pw = spec.commandLine().getOut();
        pw.println("wrote " + out + ": " + field + " on " + nodes.get(0) + " x " + nodes.get(1) + " x " + nodes.get(2)
                + " nodes; use it as --field grid:" + out);
        pw.flush();
        return 0;
    }
}
