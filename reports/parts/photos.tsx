// The photos page: the photos the auditor chose when issuing, before/after pairs side by side,
// the rest grouped by tag, each with its caption. Images are the stored thumbnails (JPEG bytes
// handed in by the caller); nothing here reads storage or the database.
import { Fragment } from "react";
import { Image, Text, View } from "@react-pdf/renderer";
import { arrangePhotos } from "@/lib/documents/photo-groups";
import type { SnapshotPhoto } from "@/lib/documents/snapshot";
import { Heading, P } from "./blocks";
import * as t from "./text";
import { colors, s } from "./theme";

const CONTENT_W = 612 - 2 * 48;
const GAP = 12;
const HALF = (CONTENT_W - GAP) / 2;

const tagNames: Record<SnapshotPhoto["tag"], string> = { before: "Before", during: "During the work", after: "After", thermal: "Thermal image" };

function captionOf(p: SnapshotPhoto) {
  return [p.surfaceLabel, p.caption].filter(Boolean).join(": ") || tagNames[p.tag];
}

function PhotoCell({ photo, image, label }: { photo: SnapshotPhoto; image?: Buffer; label?: string }) {
  const ratio = photo.width && photo.height ? photo.height / photo.width : 0.75;
  const h = Math.min(HALF * ratio, 230);
  return (
    <View style={{ width: HALF }} wrap={false}>
      {image ? (
        // eslint-disable-next-line jsx-a11y/alt-text -- a React-PDF image (PDF XObject), not an <img>; the caption below describes it
        <Image src={{ data: image, format: "jpg" }} style={{ width: HALF, height: h, objectFit: "contain", backgroundColor: colors.paperDeep, borderRadius: 3 }} />
      ) : (
        <View style={{ width: HALF, height: 60, backgroundColor: colors.paperDeep, borderRadius: 3, justifyContent: "center", alignItems: "center" }}>
          <Text style={s.small}>Image not available</Text>
        </View>
      )}
      <Text style={{ fontSize: 8.5, fontWeight: 700, color: colors.ember700, marginTop: 3 }}>{t.pdfText((label ?? tagNames[photo.tag]).toUpperCase())}</Text>
      <Text style={{ fontSize: 9 }}>{t.pdfText(captionOf(photo))}</Text>
    </View>
  );
}

function Row({ children }: { children: React.ReactNode }) {
  return <View style={{ flexDirection: "row", gap: GAP, marginBottom: 10 }} wrap={false}>{children}</View>;
}

export function PhotosSection({ photos, images }: { photos: SnapshotPhoto[]; images: Record<string, Buffer> }) {
  const { pairs, groups } = arrangePhotos(photos);
  return (
    <>
      <Heading>Photos from your house</Heading>
      <P>{`${photos.length === 1 ? "The photo" : `The ${photos.length} photos`} your auditor chose for this report.`}</P>
      {pairs.length ? <Heading level={3} ahead={120}>Before and after</Heading> : null}
      {pairs.map((p) => (
        <Row key={p.key}>
          <PhotoCell photo={p.before} image={images[p.before.id]} label={`Before · ${p.label}`} />
          <PhotoCell photo={p.after} image={images[p.after.id]} label={`After · ${p.label}`} />
        </Row>
      ))}
      {groups.map((g) => {
        const rows: SnapshotPhoto[][] = [];
        for (let i = 0; i < g.photos.length; i += 2) rows.push(g.photos.slice(i, i + 2));
        return (
          <Fragment key={g.tag}>
            <Heading level={3} ahead={120}>{tagNames[g.tag]}</Heading>
            {rows.map((r, i) => (
              <Row key={i}>{r.map((p) => <PhotoCell key={p.id} photo={p} image={images[p.id]} />)}</Row>
            ))}
          </Fragment>
        );
      })}
    </>
  );
}
