package org.riffle.signal;

import java.util.Locale;
import java.util.Objects;

/**
 * The evaluation zones of ISO 10816-3:2009 / ISO 20816-3:2022 for broadband RMS velocity (mm/s) on
 * non-rotating parts of machines above 15 kW, 120–15 000 r/min, for one machine group and support.
 * Boundaries as given in DOMAIN.md §3, there marked "from memory — verify against the standard";
 * this class says so wherever it names the table. A value exactly on a boundary belongs to the lower
 * zone. Not the older ISO 10816-1 class I–IV table.
 *
 * <p>The zones are guidelines: the machine maker's and the site's limits take precedence
 * ({@link #CAUTION}, to be shown beside every zone). Immutable.
 *
 * @param group machine group
 * @param support support flexibility
 */
public record ZoneTable(Group group, Support support) {
    /** The caution to show beside any zone. */
    public static final String CAUTION = "The machine maker's and the site's limits take precedence over this table.";
    /** The status of the boundaries. */
    public static final String STATUS = "boundaries from memory - verify against the standard";

    /** Machine group by rated power. */
    public enum Group {
        /** Group 1: 300 kW to 50 MW. */
        ONE("1"),
        /** Group 2: 15 kW to 300 kW. */
        TWO("2");

        private final String label;

        Group(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** Support flexibility as the standard defines it. */
    public enum Support {
        RIGID, FLEXIBLE;

        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** Evaluation zones, lowest first. */
    public enum Zone {
        A("newly commissioned machines"),
        B("unrestricted long-term operation"),
        C("not for long-term operation; plan action"),
        D("damage likely");

        private final String meaning;

        Zone(String meaning) {
            this.meaning = meaning;
        }

        /** The zone's meaning in the standard's sense, plain words. */
        public String meaning() {
            return meaning;
        }
    }

    public ZoneTable {
        Objects.requireNonNull(group, "group");
        Objects.requireNonNull(support, "support");
    }

    /** Boundaries A/B, B/C, C/D in mm/s (DOMAIN.md §3, from memory — verify). */
    public double[] boundaries() {
        if (group == Group.ONE) {
            return support == Support.RIGID ? new double[] {2.3, 4.5, 7.1} : new double[] {3.5, 7.1, 11.0};
        }
        return support == Support.RIGID ? new double[] {1.4, 2.8, 4.5} : new double[] {2.3, 4.5, 7.1};
    }

    /** The zone of an RMS velocity in mm/s; a value on a boundary belongs to the lower zone. */
    public Zone zone(double velocityRmsMmS) {
        if (!(velocityRmsMmS >= 0)) {
            throw new IllegalArgumentException("velocity " + velocityRmsMmS + " mm/s is not a non-negative number");
        }
        double[] b = boundaries();
        if (velocityRmsMmS <= b[0]) {
            return Zone.A;
        }
        if (velocityRmsMmS <= b[1]) {
            return Zone.B;
        }
        return velocityRmsMmS <= b[2] ? Zone.C : Zone.D;
    }

    /**
     * The alarm level quoted with these standards as common practice (DOMAIN.md §3, from memory —
     * verify): baseline + 25 % of the B/C boundary, not above 1.25 × the B/C boundary.
     */
    public double alarm(double baselineMmS) {
        double bc = boundaries()[1];
        return Math.min(baselineMmS + 0.25 * bc, 1.25 * bc);
    }

    /** The table's name, e.g. {@code "ISO 10816-3/20816-3 group 2, rigid"}. */
    public String name() {
        return "ISO 10816-3/20816-3 group " + group.label() + ", " + support.label();
    }

    /** Name, boundaries and their status, one line. */
    public String describe() {
        double[] b = boundaries();
        return String.format(Locale.ROOT, "%s: A/B %.1f, B/C %.1f, C/D %.1f mm/s (%s)", name(), b[0], b[1], b[2],
                STATUS);
    }

    /** Parses a group: {@code 1} or {@code 2}. */
    public static Group parseGroup(String text) {
        switch (text.strip()) {
            case "1":
                return Group.ONE;
            case "2":
                return Group.TWO;
            default:
                throw new IllegalArgumentException("machine group '" + text + "' is not 1 (300 kW-50 MW) or 2 "
                        + "(15-300 kW)");
        }
    }

    /** Parses a support type: {@code rigid} or {@code flexible}. */
    public static Support parseSupport(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        for (Support s : Support.values()) {
            if (s.label().equals(t)) {
                return s;
            }
        }
        throw new IllegalArgumentException("support '" + text + "' is not rigid or flexible");
    }
}
