package org.twinorbit.integrators.guidingcenter;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.ServiceLoader;
import java.util.stream.Collectors;

/** Every {@link GuidingCenterIntegrator} on the class path, found by name. */
public final class GuidingCenterIntegrators {

    private GuidingCenterIntegrators() {}

    /** All registered guiding-center integrators, sorted by name. */
    public static List<GuidingCenterIntegrator> all() {
        List<GuidingCenterIntegrator> list = new ArrayList<>();
        ServiceLoader.load(GuidingCenterIntegrator.class).forEach(list::add);
        list.sort(Comparator.comparing(GuidingCenterIntegrator::name));
        return list;
    }

    /** The integrator of that name. @throws IllegalArgumentException listing the known names */
    public static GuidingCenterIntegrator byName(String name) {
        List<GuidingCenterIntegrator> all = all();
        for (GuidingCenterIntegrator g : all) {
            if (g.name().equals(name)) {
                return g;
            }
        }
        throw new IllegalArgumentException("unknown guiding-center integrator '" + name + "'; allowed: "
                + all.stream().map(GuidingCenterIntegrator::name).collect(Collectors.joining(", ")));
    }
}
