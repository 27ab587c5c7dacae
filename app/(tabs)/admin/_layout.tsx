import { Slot } from 'expo-router';
import { RoleGate } from '../../../components/RoleGate';
import { ADMIN_ROLES } from '../../../components/navItems';

export default function AdminLayout() {
  return (
    <RoleGate roles={ADMIN_ROLES} what="Admin">
      <Slot />
    </RoleGate>
  );
}
