package org.riffle.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine;

/** Reads the version that the build wrote into {@code org/riffle/version.properties}. */
final class VersionProvider implements CommandLine.IVersionProvider {
    /** The version string, {@code "unknown"} when the resource is missing. */
    static String version() {
        Properties p = new Properties();
        try (InputStream in = VersionProvider.class.getResourceAsStream("/org/riffle/version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            return "unknown";
        }
        return p.getProperty("version", "unknown");
    }

    @Override
    public String[] getVersion() {
        return new String[] {"riffle " + version()};
    }
}
