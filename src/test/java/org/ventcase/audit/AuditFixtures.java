package org.ventcase.audit;

/** Small invented registers for the audit tests (Kestrel Point demo site; no real vessel). */
final class AuditFixtures {

    private AuditFixtures() {
    }

    static final String HEADER = "tag,area,fluid,eos,shape,heads,diameter [m],length [m],elevation [m],level [%v],"
            + "temperature [C],pressure,mode,vapour,set pressure [barg],mawp [barg],orifice,orifice count";

    /**
     * Six computable vessels, one of each kind: pure saturated bullet, mixture sphere, vertical ammonia
     * drum with a level in metres, nitrogen-blanketed solvent (specified), gas receiver (gas-filled),
     * and a second bullet in the first area with two installed valves and a diameter in mm.
     */
    static final String SIX = HEADER + "\n"
            + "V-1001,Area 10,propane,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,17.2,,K,\n"
            + "TK-1201,Area 12,\"propane:0.6,n-butane:0.3,isobutane:0.1\",,sphere,,12,,2.5,70,20,,saturated,,14,16,,\n"
            + "V-3001,Area 30,ammonia,PR78,vertical,hemispherical,2.4,5,0.8,3.1 m,15,,saturated,,17,17.5,,\n"
            + "D-4001,Area 40,n-hexane,,vertical,2:1,2.4,6,0.8,60,30,0.5 barg,specified,\"nitrogen:0.9,n-hexane:0.1\","
            + "3.5,,J,\n"
            + "R-6001,Area 60,nitrogen,,vertical,2:1,1.2,3.5,0.5,,20,8 barg,gas-filled,,10,,,\n"
            + "V-1002,Area 10,\"propane:0.95,n-butane:0.05\",,horizontal,hemispherical,2800 mm,12,1.0,70,25,,saturated,,"
            + "17.2,,2 x J,\n";
}
