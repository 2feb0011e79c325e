package org.riffle.tui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.Map;
import org.riffle.log.Channel;
import org.riffle.triage.ChannelAssessment;

/**
 * A stand-in for the findings note until the {@code note} package lands: a short plain-text note
 * written atomically beside the first log as {@code NAME-findings.txt} (never overwriting: a numbered
 * name is chosen instead), and the comment draft as {@code NAME.riffle-draft.txt}.
 *
 * <p>Thread-safe (stateless apart from the fixed folder and name).
 */
public final class InterimNoteDesk implements NoteDesk {
    private final Path folder;
    private final String stem;

    /** Notes go beside {@code firstLog}. */
    public InterimNoteDesk(Path firstLog) {
        Path abs = firstLog.toAbsolutePath();
        this.folder = abs.getParent();
        String name = abs.getFileName().toString();
        int dot = name.lastIndexOf('.');
        this.stem = dot > 0 ? name.substring(0, dot) : name;
    }

    @Override
    public Path saveNote(Findings f) throws IOException {
        Path target = folder.resolve(stem + "-findings.txt");
        for (int i = 2; Files.exists(target); i++) {
            target = folder.resolve(stem + "-findings-" + i + ".txt");
        }
        write(target, text(f));
        return target;
    }

    @Override
    public void saveDraft(Findings f) throws IOException {
        write(folder.resolve(stem + ".riffle-draft.txt"), text(f));
    }

    private static void write(Path target, String text) throws IOException {
        Path tmp = Files.createTempFile(target.getParent(), ".riffle-", ".tmp");
        try {
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    static String text(Findings f) {
        StringBuilder sb = new StringBuilder("riffle findings (interim form)\n");
        sb.append(Chrome.CAUTION_LONG).append("\n\n");
        AssetFacts a = f.asset();
        for (int i = 0; i < AssetFacts.LABELS.size(); i++) {
            sb.append(AssetFacts.LABELS.get(i)).append(": ").append(a.field(i)).append('\n');
        }
        for (Findings.Part p : f.parts()) {
            sb.append("\nlog: ").append(p.recording().source().file()).append('\n');
            Map<String, String> comments = p.comments();
            for (int c = 0; c < p.recording().channels().size(); c++) {
                Channel ch = p.recording().channels().get(c);
                int index = c;
                String state = p.assessment().map(x -> state(x.channels().get(index))).orElse("not analysed");
                sb.append(String.format(Locale.ROOT, "  %s: %s%n", ch.name(), state));
                if (comments.containsKey(ch.name())) {
                    sb.append("    comment: ").append(comments.get(ch.name())).append('\n');
                }
            }
        }
        sb.append("\ngeneral comment: ").append(f.generalComment()).append('\n');
        return sb.toString();
    }

    private static String state(ChannelAssessment x) {
        return x.health().estimated() ? x.health().level().word() : "no estimate (" + x.health().noEstimateReason() + ")";
    }
}
