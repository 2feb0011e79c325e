package org.riffle.note;

import java.nio.file.Path;
import org.riffle.log.LogReader;
import org.riffle.log.ReadOptions;
import org.riffle.log.Recording;
import org.riffle.triage.Analyzer;
import org.riffle.triage.Baseline;
import org.riffle.triage.BaselineModel;
import org.riffle.triage.TriageParams;

/**
 * A process that does nothing but save baselines, run in its own JVM by {@code BaselineKillIT} so a
 * {@code kill -9} is all but certain to land in the middle of a save: it learns the model of a log
 * once, saves it once, says {@code saving} on standard output, then saves it again and again (100 a
 * second at most: ids are seconds, numbered up to 100) until killed. Not a test; a tool for the
 * end-to-end test only.
 *
 * <p>Arguments: log, store folder, asset.
 */
public final class BaselineChild {
    private BaselineChild() {
    }

    public static void main(String[] args) throws Exception {
        Path log = Path.of(args[0]);
        BaselineStore store = BaselineStore.at(Path.of(args[1]));
        Recording rec = LogReader.read(log, ReadOptions.defaults());
        BaselineModel model = new Analyzer(TriageParams.defaults().withThreads(1)).learn(rec,
                new Baseline(0, rec.rows(), "whole log (rows 0-" + rec.rows() + ")"));
        store.save(args[2], model, log);
        System.out.println("saving");
        System.out.flush();
        while (true) {
            try {
                store.save(args[2], model, log);
            } catch (NoteException e) {
                Thread.sleep(50); // a hundred in this second already: wait for the next
            }
        }
    }
}
