'use client';

// localStorage that never throws (private mode, full quota): the bench keeps working, only unsaved.
export const browserStore = {
  getItem(key: string): string | null {
    try {
      return window.localStorage.getItem(key);
    } catch {
      return null;
    }
  },
  setItem(key: string, value: string): void {
    try {
      window.localStorage.setItem(key, value);
    } catch {
      // nothing to do: the state lives on in memory
    }
  },
  removeItem(key: string): void {
    try {
      window.localStorage.removeItem(key);
    } catch {
      // as above
    }
  },
};
