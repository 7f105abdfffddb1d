import { Button, Classes, Menu, MenuDivider, MenuItem, PopoverNext } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';
import { useSignOut } from '@/modules/auth/hooks/useSignIn';
import type { SessionUser } from '@/modules/auth/utils/sessionStore';

export type UserMenuProps = { user: SessionUser };

/** The signed-in user's name, with sign-out. */
export function UserMenu({ user }: UserMenuProps) {
  const signOut = useSignOut();
  const navigate = useNavigate();
  const handleSignOut = () => {
    signOut();
    navigate(paths.signIn(), { replace: true });
  };
  const menu = (
    <Menu>
      <li className={`${Classes.MENU_HEADER} sc-user-menu-header`}>
        <div>{user.displayName}</div>
        <div className={Classes.TEXT_MUTED}>{user.email}</div>
      </li>
      <MenuDivider />
      <MenuItem icon={IconNames.LOG_OUT} text="Sign out" onClick={handleSignOut} />
    </Menu>
  );
  return (
    <PopoverNext content={menu} placement="bottom-end" arrow={false}>
      <Button variant="minimal" icon={IconNames.USER} endIcon={IconNames.CARET_DOWN} text={user.displayName} />
    </PopoverNext>
  );
}
