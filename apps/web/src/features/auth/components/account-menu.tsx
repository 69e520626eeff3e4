import Logout from '@mui/icons-material/Logout';
import Avatar from '@mui/material/Avatar';
import Box from '@mui/material/Box';
import Divider from '@mui/material/Divider';
import IconButton from '@mui/material/IconButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { useSignOut } from '../api/sign-out';
import { useCurrentUser } from '../stores/session-store';

const initials = (name: string) =>
  name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((part) => part[0]?.toUpperCase())
    .join('');

/** The person's initials in the app bar; opens a menu with who is signed in and "Sign out". */
export function AccountMenu({ onSignedOut }: { onSignedOut: () => void }) {
  const user = useCurrentUser();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const menuId = useId();
  const signOut = useSignOut({ onSettled: onSignedOut });
  if (!user) return null;

  return (
    <>
      <IconButton
        aria-label={`Account: ${user.name}`}
        aria-haspopup="menu"
        aria-controls={anchor ? menuId : undefined}
        aria-expanded={anchor ? 'true' : undefined}
        onClick={(e) => setAnchor(e.currentTarget)}
        color="inherit"
      >
        <Avatar sx={{ bgcolor: 'secondary.main', color: 'secondary.contrastText', width: 40, height: 40 }}>
          {initials(user.name) || '?'}
        </Avatar>
      </IconButton>
      <Menu id={menuId} anchorEl={anchor} open={Boolean(anchor)} onClose={() => setAnchor(null)}>
        <Box sx={{ px: 2, py: 1.5 }}>
          <Typography sx={{ fontWeight: 500 }}>{user.name}</Typography>
          <Typography variant="body2" sx={{ color: 'text.secondary' }}>
            {user.email}
          </Typography>
        </Box>
        <Divider />
        <MenuItem
          onClick={() => {
            setAnchor(null);
            signOut.mutate();
          }}
        >
          <ListItemIcon>
            <Logout />
          </ListItemIcon>
          Sign out
        </MenuItem>
      </Menu>
    </>
  );
}
