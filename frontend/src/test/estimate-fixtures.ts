import type { House, HouseCoolingEstimate, HouseHeatingEstimate } from '../api/types';

/**
 * Result fixtures shaped like the generated API types, captured from the API for the invented
 * demo House B (a 20 × 96 ft single-poly quonset; one heater, one fan), with the assumption lists
 * shortened. Used by the result panels' component tests.
 */
export const demoHouseB: House = {
  "id": 2,
  "farmId": 1,
  "name": "House B – bedding plants",
  "notes": "Invented demo house: 20 × 96 ft quonset, single poly, a single natural-gas heater and one small fan.",
  "shape": "quonset",
  "spans": 1,
  "widthM": 6.096,
  "lengthM": 29.261,
  "eaveHeightM": 1.219,
  "ridgeHeightM": 3.353,
  "coverings": {
    "roof": "poly-single",
    "sidewalls": "poly-single",
    "endwalls": "poly-single"
  },
  "coveringUOverridesWPerM2K": {},
  "airLeakageClassId": "new-film-single",
  "airChangesPerHourOverride": null,
  "perimeterInsulated": false,
  "curtainId": null,
  "heaters": [
    {
      "count": 1,
      "ratedInputW": 87921,
      "efficiency": 0.8,
      "fuelId": "natural-gas"
    }
  ],
  "exhaustFans": {
    "count": 1,
    "capacityEachM3PerS": 3.776
  },
  "inletAreaM2": 1.2,
  "setpoints": {
    "dayHeatingC": 15,
    "nightHeatingC": 10,
    "coolingC": 24
  },
  "createdAt": "2026-12-01T22:22:03.217Z",
  "updatedAt": "2026-12-01T22:22:03.217Z"
};

export const demoHouseBHeating: HouseHeatingEstimate = {
  "geometry": {
    "floorAreaM2": 178.375056,
    "roofAreaM2": 231.901468756456,
    "sidewallAreaM2": 71.338318,
    "endwallAreaM2": 33.80459458747329,
    "coverAreaM2": 337.0443813439293,
    "perimeterM": 70.714,
    "volumeM3": 494.57812111202793
  },
  "heatLoss": {
    "insideC": 10,
    "outsideC": -29,
    "deltaTK": 39,
    "totalW": 96639.48500069606,
    "coveringW": 87675.35491899632,
    "perimeterW": 3805.82748,
    "infiltrationW": 5158.302601699728,
    "curtainApplied": false,
    "components": [
      {
        "key": "roof",
        "label": "Roof (Single polyethylene film)",
        "quantity": 231.901468756456,
        "quantityUnit": "m2",
        "coefficient": 6.67,
        "conductanceWPerK": 1546.7827966055615,
        "watts": 60324.5290676169,
        "share": 0.6242223772941506
      },
      {
        "key": "sidewalls",
        "label": "Sidewalls (Single polyethylene film)",
        "quantity": 71.338318,
        "quantityUnit": "m2",
        "coefficient": 6.67,
        "conductanceWPerK": 475.82658106,
        "watts": 18557.23666134,
        "share": 0.1920254092952414
      },
      {
        "key": "endwalls",
        "label": "Endwalls (Single polyethylene film)",
        "quantity": 33.80459458747329,
        "quantityUnit": "m2",
        "coefficient": 6.67,
        "conductanceWPerK": 225.47664589844683,
        "watts": 8793.589190039427,
        "share": 0.09099375053557135
      },
      {
        "key": "perimeter",
        "label": "Uninsulated perimeter",
        "quantity": 70.714,
        "quantityUnit": "m",
        "coefficient": 1.38,
        "conductanceWPerK": 97.58532,
        "watts": 3805.82748,
        "share": 0.03938170283060374
      },
      {
        "key": "infiltration",
        "label": "Air leakage (infiltration)",
        "quantity": 494.57812111202793,
        "quantityUnit": "m3",
        "coefficient": 0.8,
        "conductanceWPerK": 132.264169274352,
        "watts": 5158.302601699728,
        "share": 0.05337676004443293
      }
    ]
  },
  "heater": {
    "safetyMargin": 0.15,
    "requiredOutputW": 111135.40775080047,
    "requiredInputW": 138919.25968850058,
    "installedInputW": 87921,
    "installedOutputW": 70336.8,
    "verdict": "short",
    "shortfallW": 40798.60775080047,
    "lowestHeldOutdoorC": -18.385242325952404,
    "unitCount": 1,
    "largestUnitOutputW": 70336.8,
    "holdsWithLargestUnitOutC": null,
    "splitAdvice": "A single unit: if it fails the house has no heat. It alone holds {{temperature:10}} inside down to {{temperature:-18.3853}} outside. Use at least 2 units (for example 2 × {{power:55567.7}} output) so one failure does not leave the crop unheated.",
    "fuelFired": true
  },
  "condensation": {
    "insideC": 10,
    "insideRelativeHumidityPct": 85,
    "dewPointC": 7.59750013256991,
    "anyCondenses": true,
    "surfaces": [
      {
        "group": "roof",
        "coveringId": "poly-single",
        "uWPerM2K": 6.67,
        "insideSurfaceC": -17.940923737916215,
        "condenses": true,
        "condensationBelowOutdoorC": 6.646585642312722
      },
      {
        "group": "sidewalls",
        "coveringId": "poly-single",
        "uWPerM2K": 6.67,
        "insideSurfaceC": -21.153293413173653,
        "condenses": true,
        "condensationBelowOutdoorC": 6.992372729678973
      },
      {
        "group": "endwalls",
        "coveringId": "poly-single",
        "uWPerM2K": 6.67,
        "insideSurfaceC": -21.153293413173653,
        "condenses": true,
        "condensationBelowOutdoorC": 6.992372729678973
      }
    ]
  },
  "assumptions": [
    {
      "key": "coverings.roof.uWPerM2K",
      "label": "U-value, roof: Single polyethylene film",
      "value": 6.67,
      "unit": "W/(m²·K)",
      "source": "test source for the roof U-value",
      "confidence": "memory",
      "overridden": false
    },
    {
      "key": "perimeter.wPerMK",
      "label": "Perimeter loss factor: Uninsulated perimeter",
      "value": 1.38,
      "unit": "W/(m·K)",
      "source": "NRAES-33 Greenhouse Engineering ch. 4 / ASABE EP406.4 perimeter heat-loss factor",
      "confidence": "memory",
      "overridden": false
    },
    {
      "key": "air.specificHeatJPerKgK",
      "label": "Specific heat of air",
      "value": 1006,
      "unit": "J/(kg·K)",
      "source": "ASHRAE 2017 Fundamentals ch. 1 eq. 30 (h = 1.006 t + W(2501 + 1.86 t) kJ/kg), as",
      "confidence": "verified",
      "overridden": false
    },
    {
      "key": "air.pressurePa",
      "label": "Barometric pressure at {{length:313}} (standard atmosphere)",
      "value": 97620.9329600094,
      "unit": "Pa",
      "source": "computed with psychrolib (ASHRAE 2017 Fundamentals ch. 1): standard-atmosphere pressure at the site elevation",
      "confidence": "derived",
      "overridden": false
    },
    {
      "key": "heater.safetyMargin",
      "label": "Sizing margin over design heat loss",
      "value": 0.15,
      "unit": "fraction",
      "source": "Common practice among greenhouse heating designers (margin of 10–25 % for pick-u",
      "confidence": "common-practice",
      "overridden": false
    },
    {
      "key": "heater.minimumUnitCount",
      "label": "Minimum number of heating units",
      "value": 2,
      "unit": "units",
      "source": "Sanford, Univ. Wisconsin Extension A3907-02 'Greenhouse unit heaters: types, pla",
      "confidence": "verified",
      "overridden": false
    },
    {
      "key": "heater.efficiency",
      "label": "Heater efficiency for the required input (input-weighted mean of the installed heaters)",
      "value": 0.8,
      "unit": "fraction",
      "source": "entered for this house",
      "confidence": "user-entered",
      "overridden": false
    }
  ],
  "cautions": [
    "Installed output {{power:70337.1}} is {{power:40798.4}} short of the {{power:111135}} required; it holds {{temperature:10}} inside only down to {{temperature:-18.3853}} outside.",
    "Only one heating unit: if it fails the crop has no heat. Split the output over at least two units.",
    "Water condenses on the inside of the roof, sidewalls, endwalls at these conditions (dew point {{temperature:7.5975}}). Drip wets foliage and spreads disease: consider a second layer or anti-condensate film, air movement, or venting and heating to lower humidity.",
    "Covering U-values and air-change rates are handbook values not yet checked against the primary tables; treat the heat loss as a planning range and enter a maker's tested U-value where you have one.",
    "Fuel-fired heaters need a fresh-air inlet for combustion: a free area of at least about {{areaPerPower:8.805e-7}} of heater input (about {{smallArea:0.0774147}} for the {{power:87921.3}} entered); local codes may require more.",
    "Vent every fuel-fired heater to the outside through a sound flue. Chimneys: at least {{length:0.61}} above the ridge, {{length:0.91}} above the roof where they pass through, and {{length:3.05}} horizontally from the nearest roof; exhaust fans can pull flue gas back into the house.",
    "Carbon monoxide from a faulty, unvented or back-drafting heater can kill people. Fit carbon monoxide alarms (NIOSH recommended limit 35 ppm over 8 h).",
    "Incomplete combustion releases ethylene, which injures sensitive crops from about 0.05 ppm, and sulfur-bearing fuels release sulfur dioxide, injurious from about 0.5 ppm. A yellow or orange flame signals trouble; unvented heaters are not recommended even as back-up.",
    "Have fuel-fired equipment sized, installed and serviced by licensed installers under local codes.",
    "Estimates are for planning. Heater selection and installation rest with licensed installers and local codes."
  ],
  "houseId": 2,
  "conditionsUsed": {
    "designOutdoorC": -29,
    "elevationM": 313,
    "insideRelativeHumidityPct": 85,
    "insideC": 10,
    "curtainClosed": false
  },
  "conditionsSource": {
    "designOutdoorC": "farm climate",
    "elevationM": "farm",
    "insideRelativeHumidityPct": "reference data",
    "insideC": "house night setpoint",
    "curtainClosed": "default"
  }
};

export const demoHouseBCooling: HouseCoolingEstimate = {
  "airExchange": {
    "installedFlowM3PerS": 3.776,
    "airChangesPerHour": 27.485243320985653,
    "airChangesPerMinute": 0.45808738868309423,
    "flowPerFloorAreaM3PerSM2": 0.02116887912848083
  },
  "capacity": {
    "baseRateM3PerSM2": 0.04064,
    "factors": {
      "elevation": 1.0410761154855643,
      "light": 1,
      "temperatureRise": 1,
      "velocity": 1.0206172381637924,
      "house": 1.0410761154855643,
      "applied": 1.0410761154855643
    },
    "requiredFlowM3PerS": 7.5469297026560005,
    "installedFlowM3PerS": 3.776,
    "verdict": "short",
    "fansNeeded": 2,
    "additionalFansNeeded": 1,
    "inletAreaNeededM2": 3.714040208,
    "inletAreaM2": 1.2,
    "inletVerdict": "short"
  },
  "designDay": {
    "date": "2026-07-21",
    "hours": [
      {
        "hour": 0,
        "outdoorC": 21.16,
        "sunAltitudeDeg": -23.50303586984886,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 21.16,
        "fanFraction": 0,
        "indoorWithPadsC": null,
        "setpointHeld": true
      },
      {
        "hour": 1,
        "outdoorC": 20.560000000000002,
        "sunAltitudeDeg": -22.11558620095132,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 20.560000000000002,
        "fanFraction": 0,
        "indoorWithPadsC": null,
        "setpointHeld": true
      },
      {
        "hour": 2,
        "outdoorC": 19.96,
        "sunAltitudeDeg": -18.110055209620317,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 19.96,
        "fanFraction": 0,
        "indoorWithPadsC": null,
        "setpointHeld": true
      },
      {
        "hour": 3,
        "outdoorC": 19.48,
        "sunAltitudeDeg": -11.914364481626018,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 19.48,
        "fanFraction": 0,
        "indoorWithPadsC": null,
        "setpointHeld": true
      },
      {
        "hour": 4,
        "outdoorC": 19.12,
        "sunAltitudeDeg": -4.042961786527693,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 19.12,
        "fanFraction": 0,
        "indoorWithPadsC": null,
        "setpointHeld": true
      },
      {
        "hour": 5,
        "outdoorC": 19,
        "sunAltitudeDeg": 4.7169469256043515,
        "globalHorizontalWPerM2": 25.072105868720193,
        "solarGainW": 1967.784846883193,
        "indoorWithFansC": 19.79689886744781,
        "fanFraction": 0,
        "indoorWithPadsC": null,
        "setpointHeld": true
      },
      {
        "hour": 6,
        "outdoorC": 19.240000000000002,
        "sunAltitudeDeg": 14.479581181940189,
        "globalHorizontalWPerM2": 201.5677788438464,
        "solarGainW": 15820.052089189356,
        "indoorWithFansC": 24,
        "fanFraction": 0.19490528497398632,
        "indoorWithPadsC": null,
        "setpointHeld": true
      },
      {
        "hour": 7,
        "outdoorC": 19.84,
        "sunAltitudeDeg": 24.789524533878748,
        "globalHorizontalWPerM2": 390.8773392717982,
        "solarGainW": 30678.017603964723,
        "indoorWithFansC": 24.323018937790252,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 8,
        "outdoorC": 20.92,
        "sunAltitudeDeg": 35.25696030471763,
        "globalHorizontalWPerM2": 566.4166619053324,
        "solarGainW": 44455.22566614656,
        "indoorWithFansC": 27.431585495112763,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 9,
        "outdoorC": 22.48,
        "sunAltitudeDeg": 45.47578939835474,
        "globalHorizontalWPerM2": 716.5143062084508,
        "solarGainW": 56235.642977682764,
        "indoorWithFansC": 30.74496240718063,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 10,
        "outdoorC": 24.28,
        "sunAltitudeDeg": 54.79588556323306,
        "globalHorizontalWPerM2": 831.4012933571665,
        "solarGainW": 65252.55099486509,
        "indoorWithFansC": 33.90729746047708,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 11,
        "outdoorC": 26.32,
        "sunAltitudeDeg": 61.95312634665649,
        "globalHorizontalWPerM2": 903.5092682797202,
        "solarGainW": 70911.94718340221,
        "indoorWithFansC": 36.8277809059119,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 12,
        "outdoorC": 28.24,
        "sunAltitudeDeg": 64.8034514702336,
        "globalHorizontalWPerM2": 928.0476768899978,
        "solarGainW": 72837.84478780624,
        "indoorWithFansC": 39.07693758774628,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 13,
        "outdoorC": 29.68,
        "sunAltitudeDeg": 61.93802496435234,
        "globalHorizontalWPerM2": 903.3727822728466,
        "solarGainW": 70901.23507578972,
        "indoorWithFansC": 40.26063381529623,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 14,
        "outdoorC": 30.64,
        "sunAltitudeDeg": 54.76986805214241,
        "globalHorizontalWPerM2": 831.1126928830918,
        "solarGainW": 65229.90017954621,
        "indoorWithFansC": 40.39376174516623,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 15,
        "outdoorC": 31,
        "sunAltitudeDeg": 45.44098817028143,
        "globalHorizontalWPerM2": 716.0438655323553,
        "solarGainW": 56198.720429627756,
        "indoorWithFansC": 39.40961703121762,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 16,
        "outdoorC": 30.64,
        "sunAltitudeDeg": 35.2130682595871,
        "globalHorizontalWPerM2": 565.7233048744371,
        "solarGainW": 44400.807522492425,
        "indoorWithFansC": 37.27920834886043,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 17,
        "outdoorC": 29.8,
        "sunAltitudeDeg": 24.734906771235643,
        "globalHorizontalWPerM2": 389.9122081254218,
        "solarGainW": 30602.269262160535,
        "indoorWithFansC": 34.367937621120966,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 18,
        "outdoorC": 28.48,
        "sunAltitudeDeg": 14.411908059288297,
        "globalHorizontalWPerM2": 200.28776642855638,
        "solarGainW": 15719.590283235813,
        "indoorWithFansC": 30.819965030527577,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 19,
        "outdoorC": 26.92,
        "sunAltitudeDeg": 4.634997085932672,
        "globalHorizontalWPerM2": 23.935446604613375,
        "solarGainW": 1878.574116532485,
        "indoorWithFansC": 27.198721790177245,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 20,
        "outdoorC": 25.36,
        "sunAltitudeDeg": -4.1470455682915,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 25.36,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 21,
        "outdoorC": 24.04,
        "sunAltitudeDeg": -12.041497127782323,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 24.04,
        "fanFraction": 1,
        "indoorWithPadsC": null,
        "setpointHeld": false
      },
      {
        "hour": 22,
        "outdoorC": 22.84,
        "sunAltitudeDeg": -18.262295086690848,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 22.84,
        "fanFraction": 0,
        "indoorWithPadsC": null,
        "setpointHeld": true
      },
      {
        "hour": 23,
        "outdoorC": 21.88,
        "sunAltitudeDeg": -22.29222250807042,
        "globalHorizontalWPerM2": 0,
        "solarGainW": 0,
        "indoorWithFansC": 21.88,
        "fanFraction": 0,
        "indoorWithPadsC": null,
        "setpointHeld": true
      }
    ],
    "peakIndoorWithFansC": 40.39376174516623,
    "peakIndoorWithPadsC": null,
    "hoursNotHeld": [
      7,
      8,
      9,
      10,
      11,
      12,
      13,
      14,
      15,
      16,
      17,
      18,
      19,
      20,
      21
    ]
  },
  "pads": null,
  "staging": {
    "deadbandK": 9,
    "requiredDeadbandK": 2,
    "ok": true,
    "warnings": [],
    "stages": [
      {
        "stage": 1,
        "onAtC": 24,
        "fans": 1
      }
    ]
  },
  "winterVentilation": {
    "fractionOfSummerRate": 0.25,
    "flowM3PerS": 1.8867324256640001,
    "airChangesPerHour": 13.733395074409035,
    "heatCostW": 88910.66154474112,
    "atOutdoorC": -29,
    "houseHeatLossW": 96302.82105209633
  },
  "assumptions": [
    {
      "key": "summerBaseRate",
      "label": "Summer exhaust rate per floor area (base)",
      "value": 0.04064,
      "unit": "m³/(s·m²)",
      "source": "J. R. Kessler Jr. (Auburn University), 'Greenhouse Ventilation and Cooling' (cop",
      "confidence": "verified",
      "overridden": false
    },
    {
      "key": "elevationFactor",
      "label": "Elevation factor F_elev",
      "value": 1.0410761154855643,
      "unit": "–",
      "source": "ASABE EP406.4 / NGMA Ventilating & Cooling standard, elevation factor table (1.0",
      "confidence": "memory",
      "overridden": false
    },
    {
      "key": "padToFanDistanceM",
      "label": "Inlet (pad) to fan distance",
      "value": 29.261,
      "unit": "m",
      "source": "House length: fans on one endwall, inlets or pads on the opposite one",
      "confidence": "common-practice",
      "overridden": false
    },
    {
      "key": "transpirationFraction",
      "label": "Share of transmitted solar heat taken up by crop transpiration",
      "value": 0.5,
      "unit": "–",
      "source": "Common practice, no single source: with a full, well-watered crop canopy roughly",
      "confidence": "common-practice",
      "overridden": false
    }
  ],
  "cautions": [
    "Fans, motors, pad pumps and their controls sit in wet locations: wiring must be done by a qualified electrician with ground-fault protection, following local electrical codes.",
    "Exhaust fans lower the house pressure; with too little inlet area they can pull flue gases back down the chimneys of vented heaters (backdrafting), bringing carbon monoxide and ethylene into the house. Keep inlets open whenever fans run and have the venting checked by a licensed installer.",
    "These figures are planning estimates from handbook methods and a clear-sky design day; final fan, inlet and pad selection rests with the equipment supplier, a licensed installer and local codes.",
    "Installed fans move {{airFlow:3.776}} against {{airFlow:7.54693}} required; about 1 more fan(s) of the same size are needed.",
    "Free inlet area {{area:1.2}} is below the {{area:3.71404}} needed: fans will move less air than rated and may backdraft heater chimneys.",
    "On the design day the cooling setpoint is not held at solar hours 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20, 21; peak indoor {{temperature:40.3938}}."
  ],
  "houseId": 2,
  "siteUsed": {
    "latitudeDeg": 45.56,
    "longitudeDeg": -94.16,
    "elevationM": 313
  },
  "conditionsUsed": {
    "designDate": "2026-07-21",
    "summerDesignC": 31,
    "dailyRangeK": 12,
    "summerDesignWetBulbC": 22,
    "winterDesignC": -29
  },
  "conditionsSource": {
    "designDate": "calendar default",
    "summerDesignC": "farm climate",
    "dailyRangeK": "farm climate",
    "summerDesignWetBulbC": "farm climate",
    "allowedTemperatureRiseK": "reference data",
    "peakInteriorLightLux": "reference data",
    "padToFanDistanceM": "house length",
    "transpirationFraction": "reference data",
    "evaporativePad": "none",
    "winterDesignC": "farm climate"
  }
};
