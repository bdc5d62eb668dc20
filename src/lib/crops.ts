import { CROPS } from '@shared/domain/crops';
import { cropKeys, type CropKey } from '@shared/schemas/sites';

/** A crop's plain English name. */
export const cropName = (key: CropKey) => CROPS[key]?.name ?? key;

/** Crops for a select, in the API's order. */
export const cropOptions = cropKeys.map((key) => ({ value: key, label: cropName(key) }));
