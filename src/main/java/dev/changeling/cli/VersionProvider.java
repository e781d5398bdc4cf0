package dev.changeling.cli;

import picocli.CommandLine;

/** The version from the jar's manifest, or "development" when run from classes. */
final class VersionProvider implements CommandLine.IVersionProvider {

    @Override
    public String[] getVersion() {
        String version = VersionProvider.class.getPackage().getImplementationVersion();
        return new String[] {"changeling " + (version == null ? "development" : version)};
    }
}
