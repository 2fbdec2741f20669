package dockline.view;

import java.nio.file.Path;
import java.util.Optional;
import javafx.stage.FileChooser;
import javafx.stage.Window;

/** The window's save dialogs: one file of one kind, with a suggested name made safe for any file system. */
final class SaveDialogs {

    private SaveDialogs() {
    }

    /**
     * Asks where to write a file (a modal save dialog on the FX thread).
     *
     * @param title  the dialog's title
     * @param kind   the files' kind in words, for the filter, e.g. {@code PNG pictures}
     * @param suffix the file name's ending with its dot, e.g. {@code .png}
     * @param folder where the dialog starts, or {@code null}
     * @param stem   the suggested name without its suffix; every run of characters other than letters, digits,
     *               {@code .}, {@code _} and {@code -} becomes one {@code -}
     * @return the chosen file, or empty when the dialog was cancelled
     */
    static Optional<Path> ask(Window owner, String title, String kind, String suffix, Path folder, String stem) {
        FileChooser fc = new FileChooser();
        fc.setTitle(title);
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(kind, "*" + suffix));
        if (folder != null) {
            fc.setInitialDirectory(folder.toFile());
        }
        fc.setInitialFileName(stem.replaceAll("[^A-Za-z0-9._-]+", "-") + suffix);
        java.io.File f = fc.showSaveDialog(owner);
        return f == null ? Optional.empty() : Optional.of(f.toPath());
    }
}
