/**
 * Directive 2003/10/EC (minimum health and safety requirements regarding the exposure of
 * workers to the risks arising from physical agents — noise), Article 3.
 *
 * Exposure action and limit values for the daily noise exposure level L_EX,8h:
 * lower exposure action value 80 dB(A), upper exposure action value 85 dB(A), exposure limit
 * value 87 dB(A); peak sound pressure 135, 137 and 140 dB(C). The limit value takes account of
 * the attenuation of the hearing protectors worn; the action values do not.
 */

/** Article 3(1) values of L_EX,8h, dB(A). */
export const EXPOSURE_VALUES_DB = { lowerAction: 80, upperAction: 85, limit: 87 } as const;
/** Article 3(1) values of peak sound pressure p_peak, dB(C) re 20 µPa. */
export const PEAK_VALUES_DBC = { lowerAction: 135, upperAction: 137, limit: 140 } as const;

export type ExposureBand = 'below lower action value' | 'lower action value' | 'upper action value' | 'limit value';

/**
 * Which Article 3 value a daily exposure reaches (at or above).
 * @example exposureBand(85) // 'upper action value'
 */
export function exposureBand(dailyExposureDb: number): ExposureBand {
  if (dailyExposureDb >= EXPOSURE_VALUES_DB.limit) return 'limit value';
  if (dailyExposureDb >= EXPOSURE_VALUES_DB.upperAction) return 'upper action value';
  if (dailyExposureDb >= EXPOSURE_VALUES_DB.lowerAction) return 'lower action value';
  return 'below lower action value';
}
