package org.twinorbit.harness.run;

import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.Pushers;
import org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrator;
import org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrators;
import java.util.List;

/** The integrators on the class path by name, with messages that name the harness option. */
public final class Registry {

    private Registry() {}

    public static List<FullOrbitPusher> pushers() {
        return Pushers.all();
    }

    public static List<GuidingCenterIntegrator> guidingCenterIntegrators() {
        return GuidingCenterIntegrators.all();
    }

    public static List<String> pusherNames() {
        return Pushers.names();
    }

    public static List<String> guidingCenterNames() {
        return guidingCenterIntegrators().stream().map(GuidingCenterIntegrator::name).toList();
    }

    /**
     * The current name of a pusher: a deprecated old name is replaced by its new one, with a
     * warning on stderr (once per name and run); any other name is returned as it is.
     */
    public static String current(String name) {
        String now = Pushers.DEPRECATED.get(name);
        if (now == null) {
            return name;
        }
        if (WARNED.add(name)) {
            System.err.println("twinorbit: warning: pusher name '" + name + "' is deprecated, use '" + now
                    + "'; the old name goes in the next release");
        }
        return now;
    }

    private static final java.util.Set<String> WARNED = java.util.concurrent.ConcurrentHashMap.newKeySet();

    /** @throws IllegalArgumentException naming --pushers and the allowed names */
    public static FullOrbitPusher pusher(String name) {
        try {
            return Pushers.byName(name);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("pushers: " + e.getMessage(), e);
        }
    }

    /** @throws IllegalArgumentException naming --gc-integrators and the allowed names */
    public static GuidingCenterIntegrator guidingCenter(String name) {
        try {
            return GuidingCenterIntegrators.byName(name);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("gc-integrators: " + e.getMessage(), e);
        }
    }
}
