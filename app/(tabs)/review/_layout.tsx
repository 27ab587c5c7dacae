import { Slot } from 'expo-router';
import { RoleGate } from '../../../components/RoleGate';
import { CURATOR_ROLES } from '../../../components/navItems';

export default function ReviewLayout() {
  return (
    <RoleGate roles={CURATOR_ROLES} what="Review">
      <Slot />
    </RoleGate>
  );
}
