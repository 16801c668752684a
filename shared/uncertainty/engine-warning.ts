/**
 * A warning the engine raises while it builds a model: what happened (`code`), the plan step it belongs to,
 * and the figures its words need. The engine writes no words; shared/contracts/warning-text.ts does.
 */
export type EngineWarning =
  | {
      /** A net mass below the balance's USP <41> minimum weight (2·s/m ≤ 0.10 %, s not below 0.41·d). */
      code: 'belowMinimumWeight';
      stepIndex: number;
      params: { balanceItemId: string; netMassG: number; minimumWeightG: number };
    }
  | {
      /**
       * Sources of a step that Monte Carlo draws from a Student t with ν ≤ 2 (a Type A evaluation from 3 or fewer
       * readings, or a stated ν ≤ 2): their variance is infinite (JCGM 101:2008 6.4.9, from memory), so the Monte Carlo
       * standard deviation means nothing, while its coverage interval does. `degreesOfFreedom` is the smallest ν.
       */
      code: 'infiniteMonteCarloVariance';
      stepIndex: number;
      params: { sourceLabels: string[]; degreesOfFreedom: number };
    }
  | {
      /**
       * A certified solution with no density (none on its certificate, its matrix not in the lab's table) was
       * converted between mass fraction and mass concentration with water's density at the lab temperature.
       */
      code: 'assumedWaterDensity';
      stepIndex: number;
      params: {
        materialItemId: string;
        materialName: string;
        certifiedUnit: string;
        densityGPerMl: number;
        standardUncertaintyGPerMl: number;
      };
    }
  | {
      /**
       * One atomic-weight source (a standard atomic weight, or a lot's value from its certificate) holds more than
       * half of u_c². `element` is null for a molar mass from a certificate; `itemId` is the material whose
       * certificate gave the value, null for a standard atomic weight.
       */
      code: 'dominantAtomicWeight';
      stepIndex: number;
      params: { element: string | null; itemId: string | null; indexPercent: number };
    };
