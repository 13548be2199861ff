"use client";
// The formatter's context alone, with nothing of the router: components that
// are also rendered outside the app (e-mails, the look test's specimens) read
// it and get the defaults there.
import { createContext, useContext } from "react";
import { DEFAULT_PREFS, formatter, type Formatter } from "@/lib/format";

export const FormatContext = createContext<Formatter>(formatter(DEFAULT_PREFS));

export function useFormat(): Formatter {
  return useContext(FormatContext);
}
