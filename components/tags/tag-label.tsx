import { unmarkedChainWords } from "@/lib/stock/wll-words";
import { tagLabelText, type TagLabelItem } from "@/lib/tags/label";
import { tagUrl } from "@/lib/tags/qr";
import { QrCode } from "./qr-code";

export interface SheetItem extends TagLabelItem {
  id: string;
  tagCode: string;
}

/**
 * One printed tag. Sizes are physical (in, pt) so the label prints the same on any printer;
 * the sheet page's style sheet gives the two label sizes their proportions.
 */
export function TagLabel({ item, size }: { item: SheetItem; size: "small" | "large" }) {
  const text = tagLabelText(item);
  const details = [text.grade, text.size, text.length].filter(Boolean) as string[];
  return (
    <div className={`tag tag--${size}`}>
      <div className="tag__qr-column">
        <QrCode text={tagUrl(item.tagCode)} label={`QR code of tag ${item.tagCode}`} className="tag__qr" />
        {size === "large" && <p className="tag__code">{item.tagCode}</p>}
      </div>
      <div className="tag__text">
        {size === "small" && <p className="tag__code">{item.tagCode}</p>}
        <p className="tag__title">{text.title}</p>
        <p className="tag__details">{details.join(" · ")}</p>
        <p className={text.hasWll ? "tag__wll" : "tag__wll tag__wll--none"}>{text.wll}</p>
        {unmarkedChainWords(item) && <p className="tag__details">{unmarkedChainWords(item)}</p>}
        {size === "large" && <p className="tag__hint">Check before every use. Scan the QR or type the code.</p>}
      </div>
    </div>
  );
}
