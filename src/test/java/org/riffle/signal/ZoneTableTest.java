package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.riffle.signal.ZoneTable.Group;
import org.riffle.signal.ZoneTable.Support;
import org.riffle.signal.ZoneTable.Zone;

/**
 * Zone lookups at, just below and just above every boundary of every group and support. Boundaries:
 * ISO 10816-3:2009 / ISO 20816-3:2022 table as quoted in DOMAIN.md §3, there marked "from memory —
 * verify against the standard". Rule from the issue: a value exactly on a boundary belongs to the
 * lower zone. Step 0.001 mm/s: well inside the table's one-decimal precision.
 */
class ZoneTableTest {
    private static final double STEP = 0.001;

    @Test
    void boundariesAsQuotedInDomainSection3FromMemory() {
        assertArrayEquals(new double[] {2.3, 4.5, 7.1}, new ZoneTable(Group.ONE, Support.RIGID).boundaries());
        assertArrayEquals(new double[] {3.5, 7.1, 11.0}, new ZoneTable(Group.ONE, Support.FLEXIBLE).boundaries());
        assertArrayEquals(new double[] {1.4, 2.8, 4.5}, new ZoneTable(Group.TWO, Support.RIGID).boundaries());
        assertArrayEquals(new double[] {2.3, 4.5, 7.1}, new ZoneTable(Group.TWO, Support.FLEXIBLE).boundaries());
    }

    @Test
    void atBelowAndAboveEveryBoundary() {
        Zone[] zones = Zone.values();
        for (Group g : Group.values()) {
            for (Support s : Support.values()) {
                ZoneTable t = new ZoneTable(g, s);
                double[] b = t.boundaries();
                for (int i = 0; i < 3; i++) {
                    String where = t.name() + " boundary " + b[i];
                    assertEquals(zones[i], t.zone(b[i] - STEP), "below " + where);
                    assertEquals(zones[i], t.zone(b[i]), "at " + where + " (lower zone)");
                    assertEquals(zones[i + 1], t.zone(b[i] + STEP), "above " + where);
                }
                assertEquals(Zone.A, t.zone(0));
                assertEquals(Zone.D, t.zone(100));
            }
        }
    }

    /** Alarm practice (DOMAIN.md §3, from memory — verify; common practice): baseline + 25 % B/C, cap 1.25 B/C. */
    @Test
    void alarmIsBaselinePlusAQuarterOfBcCappedAtOneAndAQuarterBc() {
        ZoneTable t = new ZoneTable(Group.TWO, Support.RIGID);
        assertEquals(1.0 + 0.7, t.alarm(1.0), 1e-12, "B/C 2.8: 1.0 + 0.25 × 2.8");
        assertEquals(3.5, t.alarm(3.0), 1e-12, "3.0 + 0.7 = 3.7 capped at 1.25 × 2.8 = 3.5");
        assertEquals(3.5, t.alarm(2.8), 1e-12, "2.8 + 0.7 = 3.5 is exactly the cap");
    }

    @Test
    void nameAndDescriptionCarryTheTableAndItsStatus() {
        ZoneTable t = new ZoneTable(Group.ONE, Support.FLEXIBLE);
        assertEquals("ISO 10816-3/20816-3 group 1, flexible", t.name());
        assertEquals("ISO 10816-3/20816-3 group 1, flexible: A/B 3.5, B/C 7.1, C/D 11.0 mm/s "
                + "(boundaries from memory - verify against the standard)", t.describe());
        assertTrue(ZoneTable.CAUTION.contains("take precedence"));
    }

    @Test
    void parsingRefusesWithTheValue() {
        assertEquals(Group.TWO, ZoneTable.parseGroup("2"));
        assertEquals(Support.FLEXIBLE, ZoneTable.parseSupport("Flexible"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ZoneTable.parseGroup("3"));
        assertEquals("machine group '3' is not 1 (300 kW-50 MW) or 2 (15-300 kW)", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> ZoneTable.parseSupport("soft"));
        assertEquals("support 'soft' is not rigid or flexible", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new ZoneTable(Group.ONE, Support.RIGID).zone(-1));
        assertEquals("velocity -1.0 mm/s is not a non-negative number", e.getMessage());
    }
}
