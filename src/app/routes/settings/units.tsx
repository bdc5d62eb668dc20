import { PasswordPanel } from '@/features/settings/components/password-panel';
import { UnitsPanel } from '@/features/settings/components/units-panel';

/** /settings/units: units and the user's own password. */
export function SettingsUnitsRoute() {
  return (
    <div className="flex flex-col gap-6">
      <UnitsPanel />
      <PasswordPanel />
    </div>
  );
}
