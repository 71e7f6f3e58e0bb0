package org.ventcase.device;

/** Which published form of the viscosity correction factor Kv is used. */
public enum ViscosityCorrection {
    /**
     * API Std 520 Part I, 7th to 9th editions: Kv = (0.9935 + 2.878/Re^0.5 + 342.75/Re^1.5)^-1,
     * at most 1.
     */
    API520_7TH_TO_9TH,
    /** API Std 520 Part I, 10th edition (2020): Kv = (1 + 170/Re)^-0.5, stated for Re &gt; 80. */
    API520_10TH
}
