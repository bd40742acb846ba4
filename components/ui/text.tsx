import type { ReactNode } from 'react';
import { Text as RNText, type TextProps } from 'react-native';
import { type as t } from '@/constants/theme';

type Props = TextProps & { children?: ReactNode };

export const Title = ({ style, ...p }: Props) => <RNText accessibilityRole="header" aria-level={1} style={[t.title, style]} {...p} />;
export const Heading = ({ style, ...p }: Props) => <RNText accessibilityRole="header" aria-level={2} style={[t.heading, style]} {...p} />;
export const Body = ({ style, ...p }: Props) => <RNText style={[t.body, style]} {...p} />;
export const Small = ({ style, ...p }: Props) => <RNText style={[t.small, style]} {...p} />;
export const Mono = ({ style, ...p }: Props) => <RNText style={[t.mono, style]} {...p} />;
