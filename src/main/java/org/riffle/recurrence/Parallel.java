package org.riffle.recurrence;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Runs independent tasks on a fixed number of threads and returns their results in task order, so that
 * whatever is merged from them is merged in a fixed order. Interrupting the caller cancels the tasks.
 *
 * <p>Stateless; each call owns its pool and shuts it down before returning.
 */
final class Parallel {
    private Parallel() {
    }

    /**
     * @throws CancellationException when the calling thread is interrupted
     */
    static <T> List<T> run(int threads, List<? extends Callable<T>> tasks) {
        List<T> out = new ArrayList<>(tasks.size());
        if (threads <= 1 || tasks.size() <= 1) {
            for (Callable<T> t : tasks) {
                if (Thread.currentThread().isInterrupted()) {
                    throw new CancellationException("recurrence analysis cancelled");
                }
                out.add(call(t));
            }
            return out;
        }
        ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, tasks.size()), r -> {
            Thread t = new Thread(r, "riffle-recurrence");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<T>> futures = new ArrayList<>();
            for (Callable<T> t : tasks) {
                futures.add(pool.submit(t));
            }
            for (Future<T> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("recurrence analysis cancelled");
        } catch (ExecutionException e) {
            throw rethrow(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private static <T> T call(Callable<T> t) {
        try {
            return t.call();
        } catch (RuntimeException e) {
            throw e;
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    private static RuntimeException rethrow(Throwable cause) {
        if (cause instanceof RuntimeException r) {
            return r;
        }
        if (cause instanceof Error err) {
            throw err;
        }
        return new IllegalStateException(cause);
    }
}
