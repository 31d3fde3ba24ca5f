import type { ReactNode } from 'react';
import { Circle, Page, Rect, Svg, Text, View } from '@react-pdf/renderer';
import { COLOURS, PAGE, styles } from './theme';

/** Waygrade's mark (a level vial over a way), as in components/ui/logo.tsx. */
export function WaygradeMark({ size = 14 }: { size?: number }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 28 28">
      <Rect x={2} y={17} width={24} height={5} rx={1.5} fill={COLOURS.copper} />
      <Rect x={6} y={6} width={16} height={8} rx={4} fill="none" stroke={COLOURS.copper} strokeWidth={2} />
      <Circle cx={14} cy={10} r={2} fill={COLOURS.copper} />
    </Svg>
  );
}

export interface FrameFacts {
  machineTitle: string;
  reportLabel: string;
  verificationCode: string;
  verificationUrl: string;
}

/**
 * One A4 page with the running header (machine, report id and version) and footer (verification
 * code, where to check it, page X of Y). Header and footer repeat on pages a section overflows to.
 */
export function FramedPage({
  frame,
  children,
  bookmark,
  continuedTitle,
}: {
  frame: FrameFacts;
  children: ReactNode;
  bookmark?: string;
  /** Printed above the content on the pages a long section runs on to. */
  continuedTitle?: string;
}) {
  return (
    <Page size="A4" style={styles.page} bookmark={bookmark}>
      <View
        fixed
        style={{
          position: 'absolute',
          top: 24,
          left: PAGE.marginX,
          right: PAGE.marginX,
          flexDirection: 'row',
          alignItems: 'center',
          justifyContent: 'space-between',
          paddingBottom: 6,
          ...styles.rule,
        }}
      >
        <View style={{ flexDirection: 'row', alignItems: 'center' }}>
          <WaygradeMark size={12} />
          <Text style={{ marginLeft: 5, fontSize: 8.5, fontWeight: 600 }}>Waygrade</Text>
          <Text style={{ marginLeft: 8, fontSize: 8.5, color: COLOURS.inkSoft }}>{frame.machineTitle}</Text>
        </View>
        <Text style={{ fontSize: 8.5, color: COLOURS.inkSoft, ...styles.figures }}>{frame.reportLabel}</Text>
      </View>
      {continuedTitle ? (
        <Text
          fixed
          style={{ position: 'absolute', top: 47, left: PAGE.marginX, ...styles.eyebrow }}
          render={({ subPageNumber }) => (subPageNumber > 1 ? `${continuedTitle}, continued` : '')}
        />
      ) : null}
      {children}
      <View
        fixed
        style={{
          position: 'absolute',
          top: PAGE.height - 40,
          left: PAGE.marginX,
          right: PAGE.marginX,
          flexDirection: 'row',
          justifyContent: 'space-between',
          paddingTop: 6,
          borderTopWidth: 0.75,
          borderTopColor: COLOURS.line,
        }}
      >
        <Text style={{ fontSize: 7.5, color: COLOURS.inkSoft, ...styles.figures }}>
          Verification code {frame.verificationCode} · check it at {frame.verificationUrl}
        </Text>
        <Text style={{ fontSize: 7.5, color: COLOURS.inkSoft, ...styles.figures }} render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
    </Page>
  );
}

/** A section heading that never sits alone at the foot of a page. */
export function SectionHeading({ eyebrow, title, intro }: { eyebrow?: string; title: string; intro?: string }) {
  return (
    <View minPresenceAhead={80} wrap={false} style={{ marginBottom: 8 }}>
      {eyebrow ? <Text style={styles.eyebrow}>{eyebrow}</Text> : null}
      <Text style={{ ...styles.h2, marginTop: eyebrow ? 2 : 0 }}>{title}</Text>
      {intro ? <Text style={{ ...styles.body, color: COLOURS.inkSoft }}>{intro}</Text> : null}
    </View>
  );
}
