package org.riffle.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import org.riffle.note.Findings;
import org.riffle.signal.VibrationParams;
import org.riffle.triage.Assessment;
import org.riffle.triage.TriageParams;

/**
 * Applies events to the {@link ScreenState}: keys become {@link Action}s (or go to the prompt, the
 * questions or the visit form), analysis events fill the sources. Starts and cancels the analysis;
 * hands every change of the entries to the desk's draft and note saving to a background executor.
 *
 * <p>Confined to the UI thread.
 */
final class Controller {
    /** How the screen ended, or that it goes on. */
    enum Outcome {
        RUNNING, QUIT, INTERRUPTED
    }

    final ScreenState s;
    private final ScreenOptions options;
    private final NoteDesk desk;
    private final Consumer<Event> post;
    private final Executor io;
    private final AnalysisWork[] works;
    final Navigation nav;
    private Outcome outcome = Outcome.RUNNING;
    private boolean quitAfterSave;
    private boolean saveWhenDone;
    private Optional<Findings> earlier = Optional.empty();
    private MachineFacts appliedMachine = MachineFacts.none();
    /** Set when the next frame must be sent whole. */
    boolean fullRedraw;

    Controller(ScreenState s, ScreenOptions options, NoteDesk desk, Consumer<Event> post, Executor io) {
        this.s = s;
        this.options = options;
        this.desk = desk;
        this.post = post;
        this.io = io;
        this.works = new AnalysisWork[s.sources.size()];
        this.nav = new Navigation(s);
        offerDraft();
    }

    /** Offers the desk's draft of an earlier session, if it has one (at the start, before any key). */
    private void offerDraft() {
        earlier = desk.restorable().filter(f -> !f.isEmpty());
        if (earlier.isPresent()) {
            s.mode = ScreenState.Mode.ASK_DRAFT;
        }
    }

    /** The desk made after the first frame is ready (keys were held until now): its draft, or its problem. */
    void deskReady(Optional<String> problem) {
        offerDraft();
        problem.ifPresent(p -> s.message = p);
    }

    Outcome outcome() {
        return outcome;
    }

    /** Starts the analysis of every log. */
    void startAll() {
        for (int i = 0; i < s.sources.size(); i++) {
            restart(i, s.sources.get(i).params());
        }
    }

    private void restart(int i, TriageParams p) {
        if (works[i] != null) {
            works[i].cancel();
        }
        Source src = s.sources.get(i);
        int gen = src.restart(p);
        works[i] = AnalysisWork.start(i, gen, src.recording, p, post);
    }

    /** Cancels all analysis (at the end of the screen). */
    void cancelAll() {
        for (AnalysisWork w : works) {
            if (w != null) {
                w.cancel();
            }
        }
    }

    void dispatch(Event e) {
        if (e instanceof Event.Key k) {
            key(k.stroke());
        } else if (e instanceof Event.Tick) {
            tick();
        } else if (e instanceof Event.Saved sv) {
            saved(sv);
        } else {
            analysis(e);
        }
    }

    private void analysis(Event e) {
        if (e instanceof Event.Progress p && current(p.source(), p.generation())) {
            s.sources.get(p.source()).progress(p.channel(), p.stage(), p.fraction());
        } else if (e instanceof Event.Updated u && current(u.source(), u.generation())) {
            s.sources.get(u.source()).updated(u.channel(), u.assessment());
        } else if (e instanceof Event.Done d && current(d.source(), d.generation())) {
            s.sources.get(d.source()).finished(d.assessment());
            if (s.sources.stream().noneMatch(Source::running)) {
                s.message = "analysis finished";
                if (saveWhenDone) {
                    saveWhenDone = false;
                    save(quitAfterSave);
                }
            }
        } else if (e instanceof Event.Stopped st && current(st.source(), st.generation())) {
            Source src = s.sources.get(st.source());
            if (st.cancelled()) {
                src.cancel();
            } else {
                src.failed(st.reason());
            }
            s.message = st.reason();
            saveWhenDone = false;
            quitAfterSave = false;
        }
    }

    private boolean current(int source, int generation) {
        return s.sources.get(source).generation() == generation;
    }

    private void tick() {
        s.ticks++;
    }

    /** Ctrl-C, or the end of input (a hang-up): the screen ends, keeping the draft. */
    static boolean interrupts(KeyStroke k) {
        return k.getKeyType() == KeyType.Character && k.isCtrlDown() && k.getCharacter() == 'c'
                || k.getKeyType() == KeyType.EOF;
    }

    private void key(KeyStroke k) {
        if (interrupts(k)) {
            interrupt();
            return;
        }
        if (s.prompt != null) {
            if (s.prompt.key(k) != Prompt.Outcome.EDITING) {
                s.prompt = null;
            }
            remarksChanged();
            return;
        }
        s.message = "";
        if (s.mode == ScreenState.Mode.ASK_QUIT) {
            askQuit(k);
            return;
        }
        if (s.mode == ScreenState.Mode.ASK_DRAFT) {
            askDraft(k);
            return;
        }
        if (s.mode == ScreenState.Mode.ASSET_FORM) {
            assetForm(k);
            return;
        }
        if (s.view == View.HELP) {
            help(k);
            return;
        }
        Optional<Action> a = KeyMap.map(k, s.view);
        a.ifPresent(this::act);
    }

    private void help(KeyStroke k) {
        Optional<Action> a = KeyMap.map(k, View.HELP);
        if (a.isPresent() && (a.get() == Action.UP || a.get() == Action.DOWN || a.get() == Action.PAGE_UP
                || a.get() == Action.PAGE_DOWN)) {
            int step = a.get() == Action.UP ? -1 : a.get() == Action.DOWN ? 1 : a.get() == Action.PAGE_UP ? -10 : 10;
            s.helpTop = Math.max(0, s.helpTop + step);
        } else if (a.isPresent() && a.get() == Action.REDRAW) {
            fullRedraw = true;
        } else {
            s.view = s.beforeHelp;
        }
    }

    private void act(Action a) {
        switch (a) {
            case UP, DOWN, PAGE_UP, PAGE_DOWN, FIRST, LAST -> nav.move(a);
            case LEFT, RIGHT, FAR_LEFT, FAR_RIGHT, ZOOM_IN, ZOOM_OUT, ZOOM_ALL -> nav.time(a);
            case OPEN -> {
                if (!s.rows.isEmpty()) {
                    s.view = View.DETAIL;
                    nav.enterDetail();
                }
            }
            case BACK -> {
                if (s.baselineAnchor >= 0) {
                    s.baselineAnchor = -1;
                    s.message = "baseline marking cancelled";
                } else {
                    s.view = View.LIST;
                }
            }
            case NEXT_PANEL -> s.panel++;
            case BASELINE -> baseline();
            case ASSET -> s.mode = ScreenState.Mode.ASSET_FORM;
            case COMMENT -> comment();
            case GENERAL_COMMENT -> s.prompt = new Prompt("general comment", s.remarks.general(),
                    s.remarks::general);
            case SAVE -> save(false);
            case CANCEL_WORK -> cancelWork();
            case HELP -> {
                s.beforeHelp = s.view;
                s.view = View.HELP;
            }
            case REDRAW -> fullRedraw = true;
            case QUIT -> quit();
            case INTERRUPT -> interrupt();
            default -> {
            }
        }
    }

    private void comment() {
        if (s.rows.isEmpty()) {
            return;
        }
        ScreenState.Row r = s.row();
        Findings.ChannelRef ref = s.ref(r);
        s.prompt = new Prompt("comment on " + s.label(r), s.remarks.comment(ref), t -> s.remarks.comment(ref, t));
    }

    private void baseline() {
        if (s.view != View.DETAIL) {
            s.message = "open a channel (Enter) to mark a baseline on its trace";
            return;
        }
        if (s.baselineAnchor < 0) {
            s.baselineAnchor = s.cursor;
            s.message = "baseline: move the cursor to the other end and press b again (Esc cancels)";
            return;
        }
        int a = Math.min(s.baselineAnchor, s.cursor);
        int b = Math.max(s.baselineAnchor, s.cursor) + 1;
        s.baselineAnchor = -1;
        int source = s.row().source();
        Source src = s.sources.get(source);
        try {
            TriageParams p = src.params().withBaseline(a, b);
            p.baselineFor(src.recording.rows());
            restart(source, p);
            s.message = "recomputing against the new baseline, rows " + a + "-" + b;
        } catch (IllegalArgumentException ex) {
            s.message = "baseline not changed: " + ex.getMessage();
        }
    }

    private void assetForm(KeyStroke k) {
        Optional<Action> a = KeyMap.map(k, View.LIST);
        if (k.getKeyType() == KeyType.Enter) {
            AssetForm.Field f = AssetForm.FIELDS.get(s.assetField);
            s.prompt = new Prompt(f.label(), f.get().apply(s.remarks), t -> f.set().accept(s.remarks, t));
        } else if (k.getKeyType() == KeyType.Escape || a.isPresent() && a.get() == Action.QUIT) {
            s.mode = ScreenState.Mode.NONE;
            machineChanged();
        } else if (a.isPresent() && a.get() == Action.UP) {
            s.assetField = Math.max(0, s.assetField - 1);
        } else if (a.isPresent() && a.get() == Action.DOWN) {
            s.assetField = Math.min(AssetForm.FIELDS.size() - 1, s.assetField + 1);
        }
    }

    /** After the form: when the machine facts changed, every log is analysed again with them. */
    private void machineChanged() {
        MachineFacts m = s.remarks.machine();
        if (m.equals(appliedMachine)) {
            return;
        }
        try {
            VibrationParams v = m.toParams();
            appliedMachine = m;
            for (int i = 0; i < s.sources.size(); i++) {
                restart(i, s.sources.get(i).params().withVibration(v));
            }
            s.message = "machine facts changed: analysing again";
        } catch (IllegalArgumentException ex) {
            s.message = "not applied: " + ex.getMessage();
        }
    }

    private void cancelWork() {
        boolean any = false;
        for (int i = 0; i < works.length; i++) {
            if (works[i] != null && s.sources.get(i).running()) {
                works[i].cancel();
                s.sources.get(i).cancel();
                any = true;
            }
        }
        if (any) {
            s.message = "analysis stopped; figures so far are kept (x again runs it anew)";
            return;
        }
        for (int i = 0; i < works.length; i++) {
            Source src = s.sources.get(i);
            if (src.assessment().isEmpty() && !src.running()) {
                restart(i, src.params());
                any = true;
            }
        }
        s.message = any ? "analysis started anew" : "no analysis running";
    }

    private void quit() {
        if (s.remarks.unsaved()) {
            s.mode = ScreenState.Mode.ASK_QUIT;
        } else {
            outcome = Outcome.QUIT;
        }
    }

    private void askQuit(KeyStroke k) {
        s.mode = ScreenState.Mode.NONE;
        if (k.getKeyType() == KeyType.Character && k.getCharacter() == 's') {
            save(true);
        } else if (k.getKeyType() == KeyType.Character && k.getCharacter() == 'd') {
            outcome = Outcome.QUIT;
        }
    }

    private void askDraft(KeyStroke k) {
        if (k.getKeyType() == KeyType.Character && k.getCharacter() == 'r') {
            s.remarks.entries(earlier.orElseThrow());
            desk.draft(s.remarks.entries());
            s.mode = ScreenState.Mode.NONE;
            s.message = "earlier comments restored";
        } else if (k.getKeyType() == KeyType.Character && k.getCharacter() == 'd'
                || k.getKeyType() == KeyType.Escape) {
            s.mode = ScreenState.Mode.NONE;
            s.message = "earlier comments set aside (their draft stays until a note is saved)";
        }
    }

    private void interrupt() {
        desk.draft(s.remarks.entries());
        desk.saveDraftNow();
        outcome = Outcome.INTERRUPTED;
    }

    private void save(boolean thenQuit) {
        quitAfterSave = thenQuit;
        if (s.sources.stream().anyMatch(Source::running)) {
            saveWhenDone = true;
            s.message = "the note is saved as soon as the analysis finishes";
            return;
        }
        List<Assessment> done = new ArrayList<>();
        for (Source src : s.sources) {
            if (src.assessment().isEmpty()) {
                s.message = "no note: the analysis of " + src.recording.source().file()
                        + " did not finish (x runs it anew)";
                quitAfterSave = false;
                return;
            }
            done.add(src.assessment().get());
        }
        Findings f = s.remarks.entries();
        s.message = "saving the note ...";
        io.execute(() -> {
            try {
                post.accept(new Event.Saved(desk.saveNote(done, f).toString(), f, ""));
            } catch (Exception ex) {
                post.accept(new Event.Saved("", f, "note not saved: " + ex.getMessage()));
            }
        });
    }

    private void saved(Event.Saved sv) {
        if (!sv.error().isEmpty()) {
            s.message = sv.error();
            quitAfterSave = false;
            return;
        }
        s.remarks.saved(sv.entries());
        s.message = "note saved: " + sv.path();
        if (quitAfterSave) {
            outcome = Outcome.QUIT;
        }
    }

    private void remarksChanged() {
        desk.draft(s.remarks.entries());
    }

    ScreenOptions options() {
        return options;
    }
}
