package org.scalewright.chart;

/**
 * The series a curve chart draws, each in its own dataset of the plot at index
 * {@link #ordinal()}, drawn in this order (later ones on top). A series that has no data
 * (no reference, no proposal, nothing selected) is left out of its dataset.
 */
public enum CurveSeries {
    /** The reference scale (e.g. as first measured). */
    REFERENCE("reference"),
    /** A proposed scale (e.g. a rescaling plan). */
    PROPOSAL("proposal"),
    /** The working scale being edited. */
    WORKING("working scale"),
    /** The working scale's flagged notes. */
    FLAGGED("flagged"),
    /** The highlighted key. */
    SELECTED("selected");

    private final String label;

    CurveSeries(String label) {
        this.label = label;
    }

    /** @return the legend label */
    public String label() {
        return label;
    }

    /** @return the index of this series' dataset and renderer in the plot */
    public int index() {
        return ordinal();
    }
}
