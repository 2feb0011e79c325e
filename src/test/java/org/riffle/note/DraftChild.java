package org.riffle.note;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;

/**
 * A stand-in for the screen, run in its own JVM by {@code DraftKillIT}: it "types" the text of a file
 * as comments, lets {@link Autosave} keep the draft, says {@code typed} on standard output, and waits
 * to be killed. Not a test; a hand-run tool for the end-to-end test only.
 *
 * <p>Arguments: log, state folder, text file, autosave interval in ms, mode ({@code wait}: type once
 * and wait; {@code churn}: save two versions alternately until killed; {@code once}: save the draft
 * once, print where or the message, and exit).
 */
public final class DraftChild {
    private DraftChild() {
    }

    public static void main(String[] args) throws Exception {
        Path log = Path.of(args[0]);
        DraftStore store = DraftStore.inFolder(Path.of(args[1]));
        String text = Files.readString(Path.of(args[2]), StandardCharsets.UTF_8);
        Findings typed = typed(log, text);
        if (args[4].equals("once")) {
            try {
                System.out.println("saved: " + store.save(log, typed));
            } catch (NoteException e) {
                System.out.println(e.getMessage());
            }
            return;
        }
        if (args[4].equals("churn")) {
            Findings other = typed.withGeneral("the other version");
            store.save(log, other);
            System.out.println("typed");
            System.out.flush();
            for (long i = 0; ; i++) {
                store.save(log, i % 2 == 0 ? typed : other);
            }
        }
        Autosave autosave = store.autosave(log, Findings.EMPTY, Duration.ofMillis(Long.parseLong(args[3])));
        autosave.update(typed);
        System.out.println("typed");
        System.out.flush();
        Thread.sleep(Long.MAX_VALUE);
    }

    /** What the child types: the text as general comment and as the comment on two channels. */
    static Findings typed(Path log, String text) {
        String file = log.toString();
        return Findings.EMPTY.withSite("Hollow Creek").withAsset("P-3").withGeneral(text)
                .withComment(file, "discharge", text + "\n(discharge)")
                .withComment(file, "bearing temp", "warm\r\nto the touch\t!");
    }
}
