package org.riffle.tui;

import java.util.List;
import java.util.function.BiConsumer;
import java.util.function.Function;
import org.riffle.note.Findings;
import org.riffle.tui.Canvas.Style;

/**
 * The form for what the technician knows of the visit and the machine: site, asset, measuring point,
 * technician, operating conditions (into the note), machine group, support type, shaft speed and
 * bearing geometry (for the vibration figures). Drawn over the lower part of any view.
 *
 * <p>Stateless; called on the UI thread.
 */
final class AssetForm {
    /** One line of the form: its label, how to read it, how to set it. */
    record Field(String label, Function<Remarks, String> get, BiConsumer<Remarks, String> set) {
    }

    static final List<Field> FIELDS = List.of(
            note("site", Findings::site, Findings::withSite),
            note("asset", Findings::asset, Findings::withAsset),
            note("measuring point", Findings::point, Findings::withPoint),
            note("technician", Findings::technician, Findings::withTechnician),
            note("operating conditions", Findings::conditions, Findings::withConditions),
            new Field("machine group (1 or 2)", r -> r.machine().machineGroup(), (r, v) -> r.machine(
                    new MachineFacts(v, r.machine().support(), r.machine().shaftRpm(), r.machine().bearing()))),
            new Field("support (rigid/flexible)", r -> r.machine().support(), (r, v) -> r.machine(
                    new MachineFacts(r.machine().machineGroup(), v, r.machine().shaftRpm(), r.machine().bearing()))),
            new Field("shaft speed (r/min)", r -> r.machine().shaftRpm(), (r, v) -> r.machine(
                    new MachineFacts(r.machine().machineGroup(), r.machine().support(), v, r.machine().bearing()))),
            new Field("bearing (N,d,D[,angle])", r -> r.machine().bearing(), (r, v) -> r.machine(
                    new MachineFacts(r.machine().machineGroup(), r.machine().support(), r.machine().shaftRpm(), v))));

    private AssetForm() {
    }

    private static Field note(String label, Function<Findings, String> get,
                              java.util.function.BiFunction<Findings, String, Findings> with) {
        return new Field(label, r -> get.apply(r.entries()), (r, v) -> r.entries(with.apply(r.entries(), v)));
    }

    static void paint(Canvas c, ScreenState s) {
        int n = FIELDS.size();
        int top = c.rows() - 2 - n;
        c.field(0, top, "Visit and machine: Up/Down choose, Enter edit, Esc done (machine facts: analysed again)", c.cols(), Style.REVERSE);
        for (int i = 0; i < n; i++) {
            boolean sel = i == s.assetField;
            String v = FIELDS.get(i).get().apply(s.remarks);
            c.field(0, top + 1 + i, (sel ? "> " : "  ") + Text.fit(FIELDS.get(i).label(), 26, '~') + " "
                    + (v.isEmpty() ? "-" : v), c.cols(), sel ? Style.REVERSE : Style.PLAIN);
        }
    }
}
