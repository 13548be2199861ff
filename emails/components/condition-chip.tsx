// The condition code in an e-mail: the level's colours from lib/visual and its
// patch shape in characters (mail clients drop SVG), with the word always.
import { CONDITION_CODE, type ConditionLevel } from "@/lib/visual/condition-code";

export function ConditionChip({ level }: { level: ConditionLevel }) {
  const c = CONDITION_CODE[level];
  return (
    <span
      style={{
        display: "inline-block",
        color: c.colours.ink,
        backgroundColor: c.colours.wash,
        border: `${c.edgeWidth}px ${c.shape.dashed ? "dashed" : "solid"} ${c.colours.edge}`,
        borderRadius: 4,
        padding: "1px 8px",
        fontWeight: 700,
        fontSize: 14,
        whiteSpace: "nowrap",
      }}
      data-condition={level}
    >
      <span aria-hidden style={{ letterSpacing: 1 }}>
        {c.textMark}
      </span>{" "}
      {c.word}
    </span>
  );
}
