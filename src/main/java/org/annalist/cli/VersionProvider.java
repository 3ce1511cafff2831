package org.annalist.cli;

import org.annalist.brief.Version;
import picocli.CommandLine.IVersionProvider;

final class VersionProvider implements IVersionProvider {
    @Override
    public String[] getVersion() {
        return new String[] {"annalist " + Version.current()};
    }
}
