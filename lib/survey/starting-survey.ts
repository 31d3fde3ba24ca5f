import type { DraftSurvey } from './draft-survey-schema';

/** The listing's facts an inspector starts from; each is checked against the nameplate on site. */
export interface ListedMachine {
  latheKind: 'general_purpose' | 'toolroom';
  maker: string;
  model: string;
  serialNumber: string | null;
  yearBuilt: number | null;
  swingMm: number;
  betweenCentresMm: number;
  spindleBoreMm: number | null;
  motorKw: string | null;
  supplyVoltage: number | null;
  supplyPhases: number | null;
}

const mm = (value: number) => ({ value, unit: 'mm' as const });

/** A new survey with the machine's identity taken from the listing and the date of the visit. */
export function startingSurvey(machine: ListedMachine, inspectedOn: string): DraftSurvey {
  const motorKw = machine.motorKw === null ? null : Number(machine.motorKw);
  return {
    surveyFormatVersion: 1,
    machineType: 'centre-lathe',
    inspectedOn,
    machine: {
      latheType: machine.latheKind === 'toolroom' ? 'toolroom' : 'general-purpose',
      maker: machine.maker,
      model: machine.model,
      ...(machine.serialNumber ? { serialNumber: machine.serialNumber } : {}),
      ...(machine.yearBuilt ? { year: machine.yearBuilt } : {}),
      swingOverBed: mm(machine.swingMm),
      distanceBetweenCentres: mm(machine.betweenCentresMm),
      ...(machine.spindleBoreMm ? { spindleBore: mm(machine.spindleBoreMm) } : {}),
      ...(motorKw && motorKw > 0 ? { motorPower: { value: motorKw, unit: 'kW' as const } } : {}),
      ...(machine.supplyVoltage && (machine.supplyPhases === 1 || machine.supplyPhases === 3)
        ? { supply: { voltage: machine.supplyVoltage, phases: machine.supplyPhases, frequencyHz: 50 as const } }
        : {}),
    },
  };
}
