import { create } from 'zustand';

interface SignOutState {
  /** True after the user pressed Sign out, until someone signs in again. */
  signedOut: boolean;
  markSignedOut: () => void;
  clear: () => void;
}

/**
 * Tells the sign-in guard why the user is gone: after a deliberate sign-out it must not
 * remember the last page as `next` for whoever uses the computer after them.
 */
export const useSignOutStore = create<SignOutState>()((set) => ({
  signedOut: false,
  markSignedOut: () => set({ signedOut: true }),
  clear: () => set({ signedOut: false }),
}));
