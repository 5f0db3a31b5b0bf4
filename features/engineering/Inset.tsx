// On a phone the plots reach over their panel's padding; the words around them keep it, through
// this inset, so text never runs into the panel's edge.
import { createContext, useContext, type ReactNode } from 'react';
import { View } from 'react-native';

export const PlotInset = createContext(0);

export function Inset({ children }: { children: ReactNode }) {
  const inset = useContext(PlotInset);
  return <View style={inset ? { paddingHorizontal: inset, gap: 4 } : { gap: 4 }}>{children}</View>;
}
