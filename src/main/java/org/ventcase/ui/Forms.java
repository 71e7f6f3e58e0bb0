package org.ventcase.ui;

import javafx.geometry.HPos;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Control;
import javafx.scene.control.Label;
import javafx.scene.control.MenuButton;
import javafx.scene.control.MenuItem;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.util.Duration;

import org.ventcase.units.Dimension;

/**
 * Builds form rows bound to {@link FieldModel}s: label, control, unit chooser, help button and the
 * message beside the field. Bindings only; every decision is the view-model's.
 */
final class Forms {

    private final GridPane grid = new GridPane();
    private final WizardViewModel vm;
    private int row;

    Forms(WizardViewModel vm) {
        this.vm = vm;
        grid.getStyleClass().add("form");
        grid.setHgap(10);
        grid.setVgap(4);
        ColumnConstraints label = new ColumnConstraints();
        label.setMinWidth(200);
        label.setPrefWidth(230);
        label.setHalignment(HPos.RIGHT);
        ColumnConstraints field = new ColumnConstraints();
        field.setPrefWidth(260);
        field.setHgrow(Priority.SOMETIMES);
        grid.getColumnConstraints().addAll(label, field);
    }

    GridPane grid() {
        return grid;
    }

    /** A text or quantity row. */
    TextField text(FieldModel f) {
        TextField t = new TextField();
        t.textProperty().bindBidirectional(f.text());
        t.setId(id(f));
        f.dimension().ifPresent(d -> t.setPromptText(promptFor(d)));
        String key = Messages.fieldKey(f.path());
        if (Messages.has("prompt." + key)) {
            t.setPromptText(Messages.get("prompt." + key));
        }
        add(f, t);
        return t;
    }

    /** A choice row (editable when the file may hold other text, e.g. heads). */
    ComboBox<String> choice(FieldModel f, boolean editable) {
        ComboBox<String> c = new ComboBox<>();
        c.getItems().setAll(f.choices());
        c.setEditable(editable);
        c.setMaxWidth(Double.MAX_VALUE);
        c.valueProperty().bindBidirectional(f.text());
        c.setId(id(f));
        add(f, c);
        return c;
    }

    /** A yes/no row. */
    CheckBox check(FieldModel f) {
        CheckBox c = new CheckBox(f.label());
        c.setId(id(f));
        c.setSelected("true".equals(f.text().get()));
        c.selectedProperty().addListener((o, a, b) -> f.text().set(String.valueOf(b)));
        f.text().addListener((o, a, b) -> c.setSelected("true".equals(b)));
        c.setWrapText(true);
        c.setMaxWidth(Double.MAX_VALUE);
        c.setAccessibleText(f.label());
        Label message = message(f);
        // the box sits in the field column and its help button in the same column as every other row's
        grid.add(c, 1, row);
        grid.add(help(f), 2, row);
        row++;
        grid.add(message, 1, row++, 2, 1);
        return c;
    }

    /** A heading across the form. */
    void heading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("form-heading");
        GridPane.setMargin(l, new Insets(10, 0, 2, 0));
        GridPane.setHalignment(l, HPos.LEFT);
        grid.add(l, 0, row++, 4, 1);
    }

    /** A free node across the form's field columns. */
    void span(javafx.scene.Node n) {
        grid.add(n, 1, row++, 3, 1);
    }

    private void add(FieldModel f, Control c) {
        Label l = new Label(f.label());
        l.setLabelFor(c);
        l.getStyleClass().add("field-label");
        l.setWrapText(true);
        c.setMaxWidth(Double.MAX_VALUE);
        HBox box = new HBox(4, c);
        HBox.setHgrow(c, Priority.ALWAYS);
        f.dimension().ifPresent(d -> box.getChildren().add(units(f, d)));
        c.setAccessibleText(f.label());
        c.pseudoClassStateChanged(ERROR, !f.message().get().isEmpty());
        f.message().addListener((o, a, b) -> c.pseudoClassStateChanged(ERROR, !b.isEmpty()));
        grid.add(l, 0, row);
        grid.add(box, 1, row);
        grid.add(help(f), 2, row);
        row++;
        grid.add(message(f), 1, row++, 2, 1);
    }

    private static final javafx.css.PseudoClass ERROR = javafx.css.PseudoClass.getPseudoClass("error");

    private MenuButton units(FieldModel f, Dimension d) {
        MenuButton m = new MenuButton(Messages.get("field.units"));
        m.getStyleClass().add("unit-chooser");
        m.setFocusTraversable(false);
        m.setTooltip(new Tooltip(Messages.get("field.units.tip")));
        for (String u : WizardViewModel.unitsFor(d)) {
            MenuItem i = new MenuItem(u);
            i.setMnemonicParsing(false);
            i.setOnAction(e -> vm.convert(f, u));
            m.getItems().add(i);
        }
        return m;
    }

    private static Button help(FieldModel f) {
        Button b = new Button("?");
        b.getStyleClass().add("help-button");
        b.setFocusTraversable(false);
        Tooltip t = new Tooltip(f.help());
        t.setWrapText(true);
        t.setMaxWidth(420);
        t.setShowDelay(Duration.millis(150));
        t.setShowDuration(Duration.seconds(60));
        b.setTooltip(t);
        b.setOnAction(e -> t.show(b, b.localToScreen(b.getBoundsInLocal()).getMaxX(),
                b.localToScreen(b.getBoundsInLocal()).getMinY()));
        b.setAccessibleText(f.help());
        return b;
    }

    private static Label message(FieldModel f) {
        Label m = new Label();
        m.textProperty().bind(f.message());
        m.getStyleClass().add("field-message");
        m.setWrapText(true);
        m.setMaxWidth(560);
        m.managedProperty().bind(f.message().isNotEmpty());
        m.visibleProperty().bind(f.message().isNotEmpty());
        m.setId(id(f) + "-message");
        return m;
    }

    /** A node id from a path, usable in lookups: "$.vessel.insideDiameter" -> "f-vessel-insideDiameter". */
    static String id(FieldModel f) {
        return "f-" + f.path().replaceFirst("^\\$\\.", "").replaceAll("[.\\[\\]]+", "-").replaceAll("-$", "");
    }

    private static String promptFor(Dimension d) {
        return switch (d) {
            case PRESSURE -> "e.g. 17.2 barg";
            case PRESSURE_DIFFERENCE -> "e.g. 0.5 bar";
            case TEMPERATURE -> "e.g. 45 C";
            case LENGTH -> "e.g. 3.2 m";
            case MASS_FLOW -> "e.g. 12000 kg/h";
            case POWER -> "e.g. 25 kW";
            case VOLUME -> "e.g. 2 m3";
            case THERMAL_CONDUCTIVITY -> "e.g. 0.05 W/mK";
            default -> "";
        };
    }
}
