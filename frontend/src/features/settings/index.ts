export { SettingsForm } from './components/settings-form';
export { UnitSystemToggle } from './components/unit-system-toggle';
export { useUpdateMe } from './mutations';
