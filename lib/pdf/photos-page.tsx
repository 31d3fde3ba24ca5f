import { Image, Text, View } from '@react-pdf/renderer';
import { FramedPage, SectionHeading, type FrameFacts } from './page-frame';
import { pdfText } from './pdf-text';
import type { ReportPhoto } from './report-document-data';
import { COLOURS, CONTENT_WIDTH, styles } from './theme';

/** Survey sections as the report names them, in the order the inspector works. */
const SECTION_WORDS: Record<string, string> = {
  identity: 'Identity',
  headstock: 'Headstock and lubrication',
  lubrication: 'Headstock and lubrication',
  gearbox: 'Gearbox and feeds',
  drive: 'Drive',
  bed: 'Bed and ways',
  spindle: 'Spindle',
  slides: 'Slides and screws',
  tailstock: 'Tailstock',
  testCuts: 'Test cuts',
  electrical: 'Electrical and safety',
  accessories: 'Accessories',
};

function sectionName(section: string | null) {
  if (!section) return 'General';
  return SECTION_WORDS[section] ?? section.replace(/[-_]/g, ' ').replace(/^\w/, (c) => c.toUpperCase());
}

/** The inspector's photos, two to a row, each with its section and caption. */
export function PhotosPage({ photos, frame }: { photos: readonly ReportPhoto[]; frame: FrameFacts }) {
  const width = (CONTENT_WIDTH - 14) / 2;
  return (
    <FramedPage frame={frame} bookmark="Photos">
      <SectionHeading eyebrow="Evidence" title="Photos from the inspection" intro="Taken by the inspector at the machine; captions as written on site." />
      {photos.length === 0 ? (
        <Text style={{ ...styles.panel, color: COLOURS.inkSoft }}>No photos were attached to this survey.</Text>
      ) : (
        <View style={{ flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between' }}>
          {photos.map((photo, i) => (
            <View key={i} wrap={false} style={{ width, marginBottom: 14 }}>
              {/* eslint-disable-next-line jsx-a11y/alt-text -- react-pdf's Image takes no alt; the caption below names the photo */}
              <Image src={photo.image} style={{ width, height: width * 0.68, objectFit: 'cover', backgroundColor: COLOURS.paperSunken }} />
              <Text style={{ ...styles.eyebrow, fontSize: 7, marginTop: 4 }}>
                Photo {i + 1} · {sectionName(photo.section)}
              </Text>
              <Text style={{ fontSize: 8.5 }}>{photo.caption ? pdfText(photo.caption) : 'No caption'}</Text>
            </View>
          ))}
        </View>
      )}
    </FramedPage>
  );
}
