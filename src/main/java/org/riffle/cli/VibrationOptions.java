package org.riffle.cli;

import org.riffle.signal.VibrationParams;
import org.riffle.signal.ZoneTable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The options that describe a vibration channel's machine for the severity zone: machine group,
 * support type, shaft speed. A mixin, shared by the commands that show severity.
 */
final class VibrationOptions {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec spec;

    @Option(names = "--machine-group", paramLabel = "1|2", description = "Machine group for the severity zone "
            + "(ISO 10816-3/20816-3): 1 = 300 kW to 50 MW, 2 = 15 kW to 300 kW. Give it with --support.")
    private String group;

    @Option(names = "--support", paramLabel = "rigid|flexible", description = "Support type for the severity "
            + "zone. Give it with --machine-group.")
    private String support;

    @Option(names = "--rpm", paramLabel = "R", description = "Shaft speed in r/min (default: estimated from "
            + "the spectrum, and said so).")
    private Double rpm;

    /** The parameters these options give; a bad value is a usage error naming the option. */
    VibrationParams params() {
        VibrationParams p = VibrationParams.defaults();
        try {
            if ((group == null) != (support == null)) {
                throw new IllegalArgumentException("give both --machine-group and --support for a severity zone");
            }
            if (group != null) {
                p = p.withTable(new ZoneTable(ZoneTable.parseGroup(group), ZoneTable.parseSupport(support)));
            }
            if (rpm != null) {
                p = p.withRpm(rpm);
            }
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage(), e);
        }
        return p;
    }
}
