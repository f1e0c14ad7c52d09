import { SettingsPage } from '@/features/auth/components/settings-page';

/** /settings */
export function SettingsRoute() {
  return <SettingsPage />;
}
