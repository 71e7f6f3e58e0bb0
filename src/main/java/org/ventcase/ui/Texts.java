package org.ventcase.ui;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

import org.ventcase.casefile.Templates;

/** The safety texts from {@code templates/text/} and the build version. No JavaFX. */
public final class Texts {

    private Texts() {
    }

    /** The cautions block. */
    public static String cautions() {
        return Templates.text("cautions").orElseThrow().strip().replaceAll("(?<!\\n)\\n(?!\\n)", " ");
    }

    /** The code-deferral block with the tag and input hash filled in. */
    public static String deferral(String tag, String inputHash) {
        return Templates.text("code-deferral").orElseThrow().strip().replace("{tag}", tag.isBlank() ? "this vessel" : tag)
                .replace("{inputHash}", inputHash).replaceAll("(?<!\\n)\\n(?!\\n)", " ")
                // on screen it is not a sheet: the same words for the results shown
                .replace("This sheet is", "These results are").replace("Where this sheet and", "Where these results and");
    }

    /** This build's version. */
    public static String version() {
        try (InputStream in = Texts.class.getResourceAsStream("/org/ventcase/version.properties")) {
            Properties p = new Properties();
            if (in != null) {
                p.load(in);
            }
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            return "unknown";
        }
    }
}
