package org.twinorbit.harness;

import picocli.CommandLine;

/** Reads the version from the jar manifest (set by the build). */
public final class VersionProvider implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
        String v = TwinorbitCommand.class.getPackage().getImplementationVersion();
        return new String[] {"twinorbit " + (v == null ? "(development build)" : v)};
    }
}
