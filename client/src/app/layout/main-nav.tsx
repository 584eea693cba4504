import { NavLink, Stack, Text } from '@mantine/core';
import type { Role } from '@keenroute/shared';
import { NavLink as RouterNavLink, useLocation } from 'react-router-dom';
import { navItemsFor } from '@/config/navigation';

function isActive(pathname: string, href: string): boolean {
  return href === '/' ? pathname === '/' : pathname === href || pathname.startsWith(`${href}/`);
}

export function MainNav({ role, onNavigate }: { role: Role; onNavigate?: () => void }) {
  const { pathname } = useLocation();
  return (
    <nav aria-label="Main">
      <Stack gap={4}>
        {navItemsFor(role).map((item) => (
          <NavLink
            key={item.href}
            component={RouterNavLink}
            to={item.href}
            end={item.href === '/'}
            label={<Text fw={600}>{item.label}</Text>}
            description={item.hint}
            leftSection={<item.icon size={22} stroke={1.6} aria-hidden="true" />}
            active={isActive(pathname, item.href)}
            onClick={onNavigate}
          />
        ))}
      </Stack>
    </nav>
  );
}
