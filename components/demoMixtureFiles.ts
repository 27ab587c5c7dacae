// GENERATED from library-data/demo-mixtures by tests/e2e/support/demoMixturesModule.ts — do not edit.
// Invented demo data (Wrenfold Vale scenario): the peak lists of the demo mixtures, bundled for offline use.
export const DEMO_MIXTURE_FILES = [
 {
  "id": "demo-01-honey-WV-H-0412",
  "title": "Demo mixture 01: honey WV-H-0412, syrup marker near the quantitation limit",
  "description": "Wildflower honey brought in by a member who suspected a neighbour's jars were stretched with cane syrup; 50 mg/mL in D2O with DSS and maleic acid as internal standard.",
  "fileName": "demo-01-honey-WV-H-0412.csv",
  "solvent": "D2O",
  "mhz": 400,
  "standard": {
   "entryId": "reference:maleic-acid:D2O",
   "concentrationMM": 2
  },
  "content": "# Demo mixture 01: honey WV-H-0412, syrup marker near the quantitation limit — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent D2O, 400 MHz, reference DSS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0,2857.79,1.01\n0.6069,39.22,0.9\n0.6265,84.13,3.72\n0.6505,39.57,0.46\n1.24,2273.2,1.01\n1.45,1617.89,1.09\n1.7222,191.68,1\n1.74,404.09,1.09\n1.7579,244.33,1.48\n2.6615,466.67,1.01\n2.6801,1222.75,1.04\n2.6888,57.68,0.78\n2.6985,478.93,1.08\n2.7113,36.8,0.76\n2.7197,284.48,1.05\n2.8802,298.68,0.97\n2.9197,327.07,1.19\n3.1162,39.07,0.52\n3.15,8587.54,1.01\n3.4001,120.13,0.99\n3.6015,451.66,1.11\n3.62,922.98,1.05\n3.6385,472.04,1.01\n3.7022,198.47,1.06\n3.7201,375.61,1.04\n3.7377,201.36,0.95\n4.6001,80.38,1.26\n4.79,2531.77,1.02\n6.3,1268.88,0.99\n9.4503,37.3,0.55\n",
  "spectrumFileName": "demo-01-honey-WV-H-0412.jdx"
 },
 {
  "id": "demo-02-juice-WV-J-0087",
  "title": "Demo mixture 02: apple juice WV-J-0087, crowded methyl region",
  "description": "Cloudy apple juice from the co-operative press, screened before bottling; freeze-dried and taken up in D2O with DSS.",
  "fileName": "demo-02-juice-WV-J-0087.csv",
  "solvent": "D2O",
  "mhz": 400,
  "standard": null,
  "content": "# Demo mixture 02: apple juice WV-J-0087, crowded methyl region — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent D2O, 400 MHz, reference DSS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n-0.2547,10.47,0.61\n-0.018,15.69,0.97\n0,1708.43,1.02\n0.6741,11.42,0.39\n0.8615,464.56,1.09\n0.88,953.9,1.03\n0.8985,535.06,2.12\n0.9014,402.23,2.45\n0.92,664.25,1.09\n0.9314,951.39,1.09\n0.9385,362.98,1.29\n0.9486,945.57,1.06\n1.2197,65.75,9.07\n1.3951,17.36,1.56\n1.461,9.98,1.22\n1.4677,10.13,0.43\n1.5537,27.13,1.01\n1.5722,142.35,1.02\n1.5907,280.24,1.01\n1.6092,282.51,1.02\n1.6278,135.11,1.06\n1.646,28.43,1.1\n1.7778,22.6,4.01\n1.8144,63.52,9.62\n1.82,66.53,9.53\n1.849,15.88,0.9\n1.8922,33.02,1.11\n1.9111,122.94,1.14\n1.93,182.86,1.1\n1.949,128.2,0.97\n1.9678,30.06,1.23\n2.6211,124.4,1.08\n2.64,246.53,1.08\n2.659,131.57,0.93\n2.7617,222.31,1.05\n2.78,441.88,1.04\n2.7982,228.62,0.99\n2.8097,12.04,0.61\n2.8789,10.86,0.41\n2.961,126.25,1.1\n2.98,252.61,1.04\n2.999,125.12,1.08\n3.0078,11.02,0.43\n4.015,310.66,1.08\n4.025,312.58,1.06\n4.38,475.19,1.02\n4.79,2543.67,1.01\n6.8494,252.33,1.04\n6.8706,245.59,1.07\n7.1693,249.96,1.07\n7.1906,242.89,1.08\n8.1337,10.22,0.4\n8.2915,154.88,1.08\n8.3085,164.71,0.97\n8.8115,152.22,1.07\n8.8284,158.76,1.03\n",
  "spectrumFileName": null
 },
 {
  "id": "demo-03-juice-WV-J-0091",
  "title": "Demo mixture 03: quince juice WV-J-0091, one compound moved by 0.02 ppm",
  "description": "Quince juice pressed from under-ripe fruit; the lower pH moves pale rootsine's signals 0.02 ppm downfield of the library values.",
  "fileName": "demo-03-juice-WV-J-0091.csv",
  "solvent": "D2O",
  "mhz": 400,
  "standard": null,
  "content": "# Demo mixture 03: quince juice WV-J-0091, one compound moved by 0.02 ppm — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent D2O, 400 MHz, reference DSS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0,1705.66,1.03\n1.38,751.62,1.03\n1.7611,40.09,8.42\n2.1393,130.64,9.53\n2.5812,243.12,1.08\n2.6187,253.24,1\n2.6613,244.67,1.08\n2.6999,1082.52,1.2\n2.9103,47.19,6.01\n2.927,20.5,0.91\n2.9308,14.2,1.37\n2.9826,155.83,1.14\n3,319.12,1.02\n3.0175,156.43,1.04\n3.22,752.35,1.03\n3.2718,383.96,1.07\n3.2826,186.84,1.22\n3.2883,388.43,1.11\n3.3,325.81,1.04\n3.3174,158.24,1.03\n3.38,1902.75,1.01\n3.397,23.71,0.65\n3.6248,320.48,1.05\n3.64,617.65,1.07\n3.6553,306.89,1.11\n3.8043,160.57,1.04\n3.8178,175.69,1.19\n3.8222,172.59,1.24\n3.8357,160.88,1.02\n4.0034,87.09,1.09\n4.0201,181.36,1.09\n4.0364,95.44,1.13\n4.79,2532.87,1.02\n6.316,189.61,1.07\n6.324,186.27,1.07\n6.4337,99.82,1.13\n6.4385,123.09,2.5\n6.4416,110.96,2.75\n6.4463,105.1,1.13\n7.05,312.2,1.02\n7.0583,15.53,0.41\n7.4977,191.08,1.22\n7.5023,202.72,1.18\n7.85,301.88,1.08\n",
  "spectrumFileName": "demo-03-juice-WV-J-0091.jdx"
 },
 {
  "id": "demo-04-oil-WV-O-0033",
  "title": "Demo mixture 04: cold-pressed oil WV-O-0033, seed-oil marker and oxidation aldehyde",
  "description": "Cold-pressed rapeseed oil sold at the market stall; checked for the branched ester of a cheaper seed oil and for the aldehyde of an old, oxidised batch. Diluted in CDCl3 with TMS.",
  "fileName": "demo-04-oil-WV-O-0033.csv",
  "solvent": "CDCl3",
  "mhz": 400,
  "standard": null,
  "content": "# Demo mixture 04: cold-pressed oil WV-O-0033, seed-oil marker and oxidation aldehyde — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent CDCl3, 400 MHz, reference TMS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0.8133,6.16,0.53\n0.8292,9.78,32.45\n0.8517,1914.14,1.02\n0.8683,1911.4,1.03\n0.8813,56.61,17.01\n0.9,78.14,1.17\n0.9185,40.13,1.11\n0.967,6.72,0.4\n1.0344,5.61,1.17\n1.0503,6.25,0.61\n1.0915,83.84,1.15\n1.1085,87.03,1.26\n1.27,511.15,10.03\n1.3588,12.5,119.3\n1.4285,9.31,97.22\n1.4508,17,11.07\n1.4676,13.16,92.43\n1.5093,66.21,10.34\n1.56,382.48,1.05\n1.583,87.23,1.07\n1.6015,323.65,1.02\n1.62,479.01,1.03\n1.6385,316.07,1.06\n1.657,78.53,1.17\n1.71,944.84,1.04\n1.76,943.8,1.04\n2.0212,4.91,0.57\n2.0329,7.45,1.01\n2.05,938.5,1.04\n2.2478,4.06,0.51\n2.2649,4.57,1.11\n2.2813,304.73,1.09\n2.3,631.44,1.03\n2.3187,321.7,1.02\n2.3853,7.43,1.13\n3.67,1837.48,1.07\n4.571,315.91,1.04\n4.589,311.09,1.07\n5.332,78.44,1.03\n5.35,156.89,1.05\n5.368,78.06,1.05\n6.0307,10.9,1.35\n6.0503,12.61,0.91\n6.0697,13.71,1.12\n6.0893,12.57,1.09\n6.751,10.65,1.39\n6.7703,11.45,1\n6.79,11.34,1.03\n6.8093,10.21,1.26\n7.26,188.66,1.01\n9.4901,23.38,1.02\n9.5098,23.34,1.15\n",
  "spectrumFileName": null
 },
 {
  "id": "demo-05-oil-benchtop-WV-O-0040",
  "title": "Demo mixture 05: hemp oil WV-O-0040 on the 80 MHz bench-top instrument",
  "description": "Hemp-seed oil screened on the co-operative's bench-top instrument; at 80 MHz most multiplets run into each other.",
  "fileName": "demo-05-oil-benchtop-WV-O-0040.csv",
  "solvent": "CDCl3",
  "mhz": 80,
  "standard": null,
  "content": "# Demo mixture 05: hemp oil WV-O-0040 on the 80 MHz bench-top instrument — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent CDCl3, 80 MHz, reference TMS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0.8595,271.07,1.26\n0.9498,562.79,1.3\n0.9887,418,1.35\n1.0406,311.59,1.49\n1.08,809.49,1.22\n1.1711,410,1.26\n1.2073,36.49,0.7\n1.6277,84.03,27.42\n1.8799,1720.43,1.32\n2.13,2371.22,1.23\n2.2389,61.25,2.55\n2.293,152.63,1.16\n2.3847,434.78,1.36\n2.4749,479.09,1.43\n2.5485,120.01,3.42\n2.5668,169.18,2.78\n2.6109,62.6,0.94\n2.6908,93.4,1.33\n2.7696,44.5,1.29\n3.8101,791.27,1.2\n4.4201,23.78,0.31\n5.0031,35.1,2.06\n5.0355,43.7,0.45\n6.0798,527.35,1.21\n6.8149,258.31,1.22\n6.925,267.88,1.18\n7.2601,160.43,1.12\n7.3645,271.58,1.14\n7.4745,256.69,1.22\n",
  "spectrumFileName": "demo-05-oil-benchtop-WV-O-0040.jdx"
 },
 {
  "id": "demo-06-extract-WV-X-0102",
  "title": "Demo mixture 06: hedgerow bark extract WV-X-0102 with maleic acid as qNMR standard",
  "description": "Dried marrowvine bark, extracted for the co-operative's herbal-tea members; weighed into DMSO-d6 with maleic acid at 5.0 mM for absolute amounts.",
  "fileName": "demo-06-extract-WV-X-0102.csv",
  "solvent": "DMSO-d6",
  "mhz": 400,
  "standard": {
   "entryId": "reference:maleic-acid:DMSO-d6",
   "concentrationMM": 5
  },
  "content": "# Demo mixture 06: hedgerow bark extract WV-X-0102 with maleic acid as qNMR standard — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent DMSO-d6, 400 MHz, reference TMS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0.8618,262.3,1.14\n0.88,572.36,1.06\n0.8982,280.2,1.1\n1.5037,24.99,0.85\n1.5223,107.93,1.14\n1.5407,239.14,1.07\n1.5593,235.29,1.07\n1.5777,110.01,1.16\n1.5961,23.48,1.29\n2.18,1885.36,1.06\n2.4212,174.41,1.14\n2.4399,355.48,1.11\n2.4587,182.81,1.08\n2.4952,71.15,4.93\n2.5001,98.8,1.31\n2.5047,74.92,1.41\n3.33,760.7,1.06\n3.7401,2202.29,1.08\n3.7623,13.93,0.82\n3.87,568.23,1.06\n6.1882,290.22,1.13\n6.2118,304.9,1.08\n6.2601,962.17,1.09\n6.3773,99.88,1.14\n6.3827,98.11,1.16\n6.42,762.66,1.05\n6.72,637.08,1.06\n6.7773,98.32,1.14\n6.7827,94.36,1.22\n6.98,185.21,1.05\n7.42,632.52,1.06\n7.626,9.1,0.53\n7.8681,287.76,1.14\n7.8918,306.44,1.08\n8.05,359.17,1.09\n8.0679,98.74,1.46\n8.0725,99.63,1.47\n8.0875,101.21,1.28\n8.092,93.95,3.03\n10.45,626.67,1.06\n10.5485,7.05,0.62\n12.8001,186.1,1.1\n",
  "spectrumFileName": "demo-06-extract-WV-X-0102.jdx"
 },
 {
  "id": "demo-07-extract-WV-X-0117",
  "title": "Demo mixture 07: elderflower methanol extract WV-X-0117, crowded 3.2-3.9 ppm region",
  "description": "Methanol extract of elderflower heads for a member's cordial recipe; dried and taken up in CD3OD.",
  "fileName": "demo-07-extract-WV-X-0117.csv",
  "solvent": "CD3OD",
  "mhz": 400,
  "standard": null,
  "content": "# Demo mixture 07: elderflower methanol extract WV-X-0117, crowded 3.2-3.9 ppm region — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent CD3OD, 400 MHz, reference TMS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n2.7223,127.12,1.04\n2.74,244.28,1.06\n2.7578,125.98,1.03\n3.1589,161.47,1.03\n3.1784,176.9,2.4\n3.1816,182.33,2.37\n3.2011,158.4,1.08\n3.2164,12.01,3.62\n3.2701,130.58,9.67\n3.3057,67.4,4.96\n3.31,91.29,3.14\n3.3143,65.35,5.65\n3.3275,162.01,1.13\n3.35,318.02,1.07\n3.37,1564.16,1.08\n3.3799,155.56,1.53\n3.3953,130.87,1.13\n3.4047,134.57,1.12\n3.42,129.89,1.11\n3.4321,132.83,1.08\n3.4432,133.13,1.09\n3.4569,131.84,1.04\n3.4679,130.85,1.06\n3.475,12.49,0.37\n3.4826,10.97,1.52\n3.4984,132.5,1.11\n3.5135,195.73,6.55\n3.52,1852.18,1.06\n3.5264,193.14,6.56\n3.5416,137.14,1.14\n3.55,132.05,1.12\n3.5618,129.89,1.08\n3.5782,129.74,1.06\n3.59,128.56,1.04\n3.6484,164.54,0.98\n3.6621,276.25,1.11\n3.6798,304.55,1.64\n3.6916,162.59,1.11\n3.6977,134.69,1.13\n3.7335,17.42,25.67\n3.75,771.97,1.04\n3.8131,9.73,0.45\n3.8445,13.18,0.62\n3.8526,169.84,1.12\n3.8576,168.28,1.14\n3.8824,170.43,4.65\n3.89,401.52,1.78\n4.1403,314.33,1.02\n4.1598,318.11,1.02\n4.87,998.97,1.03\n6.2902,60.22,0.96\n6.3299,60.45,1.1\n6.7998,61.01,1.1\n6.8193,290.73,1.14\n6.8407,251.77,1.04\n7.0475,32.7,1.2\n7.0519,32.66,1.18\n7.0678,31.93,1.31\n7.0725,38.55,1.11\n7.1092,247.48,1.07\n7.1307,250.21,1.04\n7.1676,71.31,1.06\n7.1723,66.48,1.12\n7.5701,63.65,1.03\n7.6098,61.06,1.05\n",
  "spectrumFileName": null
 },
 {
  "id": "demo-08-extract-WV-X-0121",
  "title": "Demo mixture 08: bitterbark ethyl acetate extract WV-X-0121 with residual solvent",
  "description": "Ethyl acetate extract of bitterbark twigs, not quite dried down; in CDCl3 with TMS.",
  "fileName": "demo-08-extract-WV-X-0121.csv",
  "solvent": "CDCl3",
  "mhz": 400,
  "standard": null,
  "content": "# Demo mixture 08: bitterbark ethyl acetate extract WV-X-0121 with residual solvent — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent CDCl3, 400 MHz, reference TMS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0.8717,141.21,1.06\n0.89,284.04,1.05\n0.9082,150.56,1.22\n0.9117,89.63,2.78\n0.93,143.4,1.07\n0.9517,489.69,1.06\n0.97,924.83,1.07\n0.9882,480.42,1.03\n1.2238,11.76,1.24\n1.2337,5.83,0.43\n1.2424,104.79,1.06\n1.2604,197.76,1.17\n1.2791,134.92,1.48\n1.2918,6.86,0.79\n1.2977,61.05,1\n1.3163,12.99,0.82\n1.3636,24.45,0.94\n1.3818,97.31,1.03\n1.4,137.84,1.08\n1.4183,94.71,1.01\n1.4363,24.98,1.1\n1.56,378.82,1.03\n1.5837,43.6,1.09\n1.5922,33.92,1.42\n1.6022,207.01,1.02\n1.6107,71.57,1.22\n1.6208,401.24,1.02\n1.6292,74.81,1.5\n1.6393,401.14,1.05\n1.6476,41.6,20.5\n1.6578,198.19,1.06\n1.6762,38.04,1.17\n2.05,187.43,1.04\n2.36,913.94,1.07\n2.4408,92.71,1.06\n2.46,186.44,1.06\n2.4795,110.16,1.53\n2.5,95.56,1.06\n2.519,43.8,1.16\n2.601,305.17,1.08\n2.62,634.99,1.01\n2.639,314.47,1.06\n2.9507,96.37,1.02\n2.97,190.07,1.02\n2.9892,94.46,1.06\n3.1845,45.55,1.12\n3.2015,138.25,1.07\n3.2185,143.23,0.99\n3.2355,46,1.12\n3.83,1907.33,1\n3.87,552.88,1.1\n3.89,1849.99,1.06\n4.0938,12.83,0.97\n4.1113,46.76,1.07\n4.1288,44.67,1.04\n4.1463,16.44,1.14\n5.3677,5.66,0.65\n5.3799,93.89,1.1\n5.4002,38.54,4.81\n6.2181,315.89,1.03\n6.2419,312.13,1.06\n6.3846,86.9,1.59\n6.39,163.28,1.17\n6.3955,101.66,3.39\n6.4,200.9,1.06\n6.6572,319.55,1.15\n6.6627,332.77,1.09\n6.78,634.29,1.01\n6.9596,158.38,1.02\n7.0004,157.81,1.04\n7.0396,162.41,0.98\n7.0804,151.97,1.1\n7.1337,5.33,0.59\n7.1434,9.1,1.73\n7.16,319.78,1.06\n7.18,339.43,1.07\n7.2,689.2,1.13\n7.26,203.34,1.12\n7.2792,41.11,14.51\n7.351,6.15,0.44\n7.4,313.41,1.05\n7.42,301.29,1.09\n7.6181,305.89,1.07\n7.6419,309.98,1.07\n",
  "spectrumFileName": null
 },
 {
  "id": "demo-09-honey-WV-H-0420",
  "title": "Demo mixture 09: heather honey WV-H-0420, two near-identical diastereomers",
  "description": "Heather honey whose aroma diol comes as two diastereomers with almost the same spectrum (the library marks them nearDuplicateOf each other).",
  "fileName": "demo-09-honey-WV-H-0420.csv",
  "solvent": "D2O",
  "mhz": 400,
  "standard": null,
  "content": "# Demo mixture 09: heather honey WV-H-0420, two near-identical diastereomers — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent D2O, 400 MHz, reference DSS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0,1715.39,1.02\n0.5919,10.39,0.98\n0.8778,10.51,0.45\n0.9015,476.27,1.06\n0.9115,191.97,1.38\n0.92,928.65,1.09\n0.93,359.95,1.13\n0.9385,467.6,1.11\n0.9484,180.43,1.05\n1.1119,334.34,1.04\n1.1283,416.43,3.12\n1.1319,964.27,1.13\n1.148,931.89,1.07\n1.4006,73.44,11.95\n1.45,918.08,1.08\n1.4771,17.47,0.55\n1.5209,71.58,9.18\n1.7828,14.47,0.86\n1.892,23.37,1.12\n1.9109,85.8,1.15\n1.93,133.82,1.14\n1.949,94.73,1.06\n2.6209,93.51,1.06\n2.64,179.36,1.08\n2.659,89.25,1.14\n2.6802,162.41,0.96\n2.7198,160.26,0.99\n2.8802,168.55,1.03\n2.8941,19.73,3.19\n2.9198,183.67,1.22\n2.961,93.92,1.05\n2.98,190.73,1.04\n2.999,93.43,1.06\n3.3945,16.62,1.64\n3.4769,12.49,0.42\n3.6679,39.09,1.24\n3.684,155.33,1.11\n3.7,243.48,1.1\n3.7037,83.37,3.33\n3.716,166.11,1.15\n3.7199,101.07,2.95\n3.732,46.13,2.89\n3.7359,59.87,2.6\n3.7524,17.03,1.02\n4.79,2541.71,1.01\n6.8494,193.3,1.01\n6.8706,183.89,1.04\n7.1693,182.24,1.07\n7.1906,183.84,1.03\n8.157,10.81,0.46\n",
  "spectrumFileName": null
 },
 {
  "id": "demo-10-extract-WV-X-0130",
  "title": "Demo mixture 10: rowan leaf extract WV-X-0130, E/Z esters and two close coumarins",
  "description": "Rowan leaves extracted in the co-operative's triage of hedgerow plants; the two marrowvine lactones' H3/H4 doublets overlap.",
  "fileName": "demo-10-extract-WV-X-0130.csv",
  "solvent": "DMSO-d6",
  "mhz": 400,
  "standard": null,
  "content": "# Demo mixture 10: rowan leaf extract WV-X-0130, E/Z esters and two close coumarins — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent DMSO-d6, 400 MHz, reference TMS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0.951,283.76,1.08\n0.9699,564.82,1.06\n0.989,263.45,1.11\n2.0009,6.17,0.79\n2.0115,92.01,1.12\n2.0305,283.32,1.06\n2.0495,263.26,1.12\n2.0637,15.02,4.03\n2.0686,94.96,1.08\n2.12,580.33,1.07\n2.1399,1799.5,1.09\n2.18,756.31,1.08\n2.2,709.56,1.1\n2.4953,73.03,4.88\n2.5001,96.11,1.31\n2.5047,71.53,4.9\n2.6018,184.55,1.1\n2.62,384.25,1.05\n2.6382,181.25,1.09\n3.1944,91.15,1.11\n3.2092,108.02,2.98\n3.2128,193.32,1.32\n3.2274,193.81,1.27\n3.2309,117.46,2.87\n3.2455,97,1.07\n3.33,760.1,1.06\n3.6401,550.55,1.08\n3.7,1920.03,1.07\n3.71,1093.38,1.14\n3.86,951.05,1.06\n3.88,700.53,1.12\n5.8644,90.48,1.05\n5.8957,87.62,1.08\n6.1881,119.22,1.2\n6.1975,153.67,1.38\n6.2024,164.34,1.25\n6.2118,123.99,1.14\n6.2681,125.74,1.08\n6.2919,131.68,1.05\n6.4601,304.64,1.07\n6.72,254.5,1.05\n6.8293,379.02,1.06\n6.8443,104.91,4.89\n6.8508,390.39,1.09\n6.86,319.82,1.1\n6.8757,94.04,1.11\n6.9382,50.9,2.76\n6.9422,57.04,2.6\n6.9577,52.42,2.76\n6.9617,52.82,2.75\n6.9799,255.64,1.1\n6.9883,180.48,2.67\n6.9922,161.55,2.81\n7.0079,169.26,2.72\n7.0116,168.83,2.72\n7.0481,342.1,2.68\n7.0519,325.22,2.74\n7.0703,99.12,1.16\n7.0893,465.09,1.11\n7.1103,788.41,1.51\n7.1305,489.36,1.48\n7.1539,6.18,0.62\n7.198,97.17,2.75\n7.202,105.46,1.2\n7.42,256.44,1.06\n7.48,243.84,1.07\n7.5001,306.76,1.08\n7.54,286.94,1.14\n7.7855,94.87,1.12\n7.8,188.92,1.07\n7.8145,92.01,1.08\n7.8681,114.62,1.11\n7.8918,121.11,1.1\n7.9081,123.62,1.08\n7.9318,129.47,1.06\n8.0289,296.94,1.1\n8.0512,301.31,1.09\n9.4,190.72,1.06\n9.5501,601.15,1.09\n10.45,250.98,1.06\n10.8508,63.23,4.82\n12.9199,309.22,1.05\n",
  "spectrumFileName": null
 },
 {
  "id": "demo-11-control-WV-H-0000",
  "title": "Demo mixture 11: blank D2O control with laboratory contaminants only",
  "description": "The weekly blank: D2O with DSS from the same bottle, glassware rinsed with ethanol and a trace of acetic acid from the cleaning bath. No library compound should be reported.",
  "fileName": "demo-11-control-WV-H-0000.csv",
  "solvent": "D2O",
  "mhz": 400,
  "standard": null,
  "content": "# Demo mixture 11: blank D2O control with laboratory contaminants only — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured\n# solvent D2O, 400 MHz, reference DSS; peaks picked at S/N >= 3 from the simulated spectrum\nshift (ppm),height,width (Hz)\n0,1710.68,1.01\n1.1524,148.82,0.99\n1.17,274.17,1.07\n1.1874,141.04,1.13\n1.7631,47.19,6.84\n1.8857,15.64,0.47\n1.9975,18.08,0.44\n2.08,359,1.07\n2.8948,26.28,0.95\n2.9071,48.44,1.57\n2.9148,40.16,6.11\n3.6237,44.45,1.03\n3.6343,18.08,0.55\n3.6413,142.52,0.94\n3.6587,142.31,1.06\n3.6766,41.46,1.17\n4.7345,16.3,0.39\n4.7658,16.02,0.46\n4.79,2546.36,1.01\n",
  "spectrumFileName": null
 }
] as const;
