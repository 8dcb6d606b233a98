package org.holdpoint.ui.swing;

import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import org.holdpoint.ui.model.PreferenceStore;

/** Drives the real window from a test thread: builds it, runs code on the event thread, waits, takes screenshots. */
final class WindowDriver {
    private final Robot robot;
    private MainWindow window;

    WindowDriver() throws Exception {
        robot = new Robot();
    }

    /** Builds and shows the window with preferences in memory only (nothing of the user's is touched). */
    MainWindow open(Themes theme, int width, int height) throws Exception {
        onEdt(() -> {
            theme.install();
            PreferenceStore prefs = PreferenceStore.inMemory();
            theme.remember(prefs);
            window = new MainWindow(prefs, org.holdpoint.Holdpoint.archives());
            window.setSize(width, height);
            window.setLocation(0, 0);
            window.setVisible(true);
            return null;
        });
        return window;
    }

    /** Runs code on the event thread and returns its value. */
    static <T> T onEdt(Callable<T> c) throws Exception {
        AtomicReference<T> v = new AtomicReference<>();
        AtomicReference<Exception> err = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                v.set(c.call());
            } catch (Exception e) {
                err.set(e);
            }
        });
        if (err.get() != null) {
            throw err.get();
        }
        return v.get();
    }

    /** Waits until a condition (checked on the event thread) holds, or fails after the timeout. */
    static void await(String what, BooleanSupplier condition, long timeoutMs) throws Exception {
        long end = System.currentTimeMillis() + timeoutMs;
        while (System.currentTimeMillis() < end) {
            if (onEdt(condition::getAsBoolean)) {
                return;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("timed out waiting for " + what);
    }

    /** Lets the window paint, then captures it into a PNG. */
    BufferedImage screenshot(Path target) throws Exception {
        robot.waitForIdle();
        Thread.sleep(400);
        robot.waitForIdle();
        Rectangle r = onEdt(() -> window.getBounds());
        BufferedImage img = robot.createScreenCapture(r);
        Files.createDirectories(target.getParent());
        ImageIO.write(img, "png", target.toFile());
        return img;
    }

    /** Lets a window (e.g. a dialog) paint, then captures it into a PNG. */
    BufferedImage screenshot(Path target, java.awt.Window w) throws Exception {
        robot.waitForIdle();
        Thread.sleep(400);
        robot.waitForIdle();
        Rectangle r = onEdt(w::getBounds);
        BufferedImage img = robot.createScreenCapture(r);
        Files.createDirectories(target.getParent());
        ImageIO.write(img, "png", target.toFile());
        return img;
    }

    void close() throws Exception {
        if (window != null) {
            onEdt(() -> {
                window.dispose();
                return null;
            });
        }
    }
}
