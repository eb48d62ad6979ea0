import { type FirmSettings, percentShare } from '@layerbook/domain';
import type { EstimatingSettings } from '../firms/estimating-types';

/**
 * The firm's settings as the estimate engine takes them: whole percents become fractions,
 * money stays a decimal string. No zod here, so the browser can import it cheaply.
 */
export function toEngineSettings(s: EstimatingSettings, lengthUnit: 'ft' | 'm', currency: string): FirmSettings {
  const share = percentShare;
  return {
    currency,
    lengthUnit,
    minDeductedOpeningArea: s.minDeductedOpeningArea,
    labourRate: s.labourRate,
    materialsMarkup: share(s.materialsMarkupPercent),
    overheadProfit: {
      method: s.overheadProfit.method,
      overhead: share(s.overheadProfit.overheadPercent),
      profit: share(s.overheadProfit.profitPercent),
    },
    ...(s.minimumCharge ? { minimumCharge: s.minimumCharge } : {}),
    tax: { mode: s.tax.mode, rate: share(s.tax.ratePercent) },
    rounding: s.rounding,
    calendar: { ...s.calendar, holidays: [...s.calendar.holidays] },
    crewSize: s.crewSize,
    setupHours: s.setupHours,
    cleanupHours: s.cleanupHours,
    multipliers: { ...s.multipliers },
    scaffoldHeight: s.scaffoldHeight,
    workingReach: s.workingReach,
  };
}
