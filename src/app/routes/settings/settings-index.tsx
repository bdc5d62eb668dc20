import { redirect } from 'react-router-dom';
import { paths } from '@/config/paths';

/** /settings opens on units, which every role has. */
export const loader = () => redirect(paths.settingsUnits);
