package org.precedence.cli;

import picocli.CommandLine.IVersionProvider;

/** Reports the version written into the jar manifest by the build. */
public final class VersionProvider implements IVersionProvider {
    @Override
    public String[] getVersion() {
        String v = PrecedenceApplication.class.getPackage().getImplementationVersion();
        return new String[] {"precedence " + (v == null ? "development build" : v)};
    }
}
