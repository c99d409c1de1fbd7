package org.meritbook.pipeline;

import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;

/**
 * Work started on a second thread, whose result the starting thread takes when it needs it: what the
 * work threw is rethrown there as it was (an input error stays an input error). The thread is a
 * daemon, so a command that fails early does not wait for work nobody will take.
 *
 * @param <T> the work's result
 */
public final class SideTask<T> {
    private final FutureTask<T> task;

    private SideTask(FutureTask<T> task) {
        this.task = task;
    }

    /** Starts {@code work} on a new daemon thread named {@code threadName}. */
    public static <T> SideTask<T> start(String threadName, Callable<T> work) {
        FutureTask<T> task = new FutureTask<>(work);
        Thread thread = new Thread(task, threadName);
        thread.setDaemon(true);
        thread.start();
        return new SideTask<>(task);
    }

    /** Work done already, on the caller's thread (what it throws is thrown here and now). */
    public static <T> SideTask<T> done(T value) {
        FutureTask<T> task = new FutureTask<>(() -> value);
        task.run();
        return new SideTask<>(task);
    }

    /**
     * Waits for the result.
     *
     * @param what what the work does, for the message if the wait is interrupted, e.g. "drawing the figures"
     */
    public T join(String what) {
        try {
            return task.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while " + what, e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(what + " failed", cause);
        }
    }
}
