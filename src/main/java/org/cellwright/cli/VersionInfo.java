package org.cellwright.cli;

import picocli.CommandLine;

/** Supplies the version text of {@code --version} from the jar manifest. */
public final class VersionInfo implements CommandLine.IVersionProvider {

    @Override
    public String[] getVersion() {
        String v = Main.class.getPackage().getImplementationVersion();
        return new String[] {"Cellwright " + (v == null ? "(development build)" : v),
                "Java " + System.getProperty("java.version")};
    }
}
