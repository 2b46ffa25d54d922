package org.twinorbit.harness;

import org.twinorbit.harness.report.ToolInfo;
import picocli.CommandLine;

/** The version and git commit the build recorded ({@link ToolInfo}), as the JSON outputs name them. */
public final class VersionProvider implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
        return new String[] {ToolInfo.NAME + " " + ToolInfo.version() + " (git commit " + ToolInfo.gitCommit() + ")"};
    }
}
