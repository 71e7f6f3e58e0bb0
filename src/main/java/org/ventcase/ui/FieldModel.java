package org.ventcase.ui;

import java.util.List;
import java.util.Optional;

import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

import org.ventcase.units.Dimension;

/**
 * One input of the case, addressed by its case-file path. The view binds a control to
 * {@link #text()} and shows {@link #message()} beside it; the view-model writes the text into the
 * draft and sets the message from the validator's problem at the same path.
 */
public final class FieldModel {

    /** How the text is stored in the case file. */
    public enum Kind {
        /** Text as typed ("17.2 barg", "V-2101"). */
        TEXT,
        /** A JSON number (mole fraction, Kd). */
        NUMBER,
        /** A JSON boolean ("true"/"false"). */
        BOOL
    }

    private final String path;
    private final Kind kind;
    private final Optional<Dimension> dimension;
    private final List<String> choices;
    private final StringProperty text = new SimpleStringProperty(this, "text", "");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private String localError = "";

    FieldModel(String path, Kind kind, Dimension dimension, List<String> choices) {
        this.path = path;
        this.kind = kind;
        this.dimension = Optional.ofNullable(dimension);
        this.choices = List.copyOf(choices);
    }

    public String path() {
        return path;
    }

    public Kind kind() {
        return kind;
    }

    /** The dimension of a quantity field (offers a unit chooser), or empty. */
    public Optional<Dimension> dimension() {
        return dimension;
    }

    /** Allowed values of a choice field (empty for free text). */
    public List<String> choices() {
        return choices;
    }

    /** The text in the control (two-way). */
    public StringProperty text() {
        return text;
    }

    /** The problem beside the field, "" when none. */
    public ReadOnlyStringProperty message() {
        return message.getReadOnlyProperty();
    }

    /** Label from the bundle. */
    public String label() {
        return Messages.orElse("label." + Messages.fieldKey(path), Messages.fieldKey(path));
    }

    /** Help text from the bundle ("" when none). */
    public String help() {
        return Messages.orElse("help." + Messages.fieldKey(path), "");
    }

    String localError() {
        return localError;
    }

    void setLocalError(String e) {
        localError = e;
    }

    void setMessage(String m) {
        message.set(m);
    }
}
