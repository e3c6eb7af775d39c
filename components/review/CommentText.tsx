// A comment's text as React elements: light formatting, safe links, highlighted @mentions.
// Never HTML: whatever a comment contains is shown as text.
import { Fragment, type ReactNode } from "react";
import { parseComment, type Inline, type Member } from "@/lib/review/comment-text";

function render(tokens: Inline[], key = ""): ReactNode[] {
  return tokens.map((t, i) => {
    const k = `${key}${i}`;
    switch (t.t) {
      case "text":
        return <Fragment key={k}>{t.text}</Fragment>;
      case "bold":
        return <strong key={k}>{render(t.children, `${k}.`)}</strong>;
      case "italic":
        return <em key={k}>{render(t.children, `${k}.`)}</em>;
      case "code":
        return (
          <code key={k} className="rounded bg-paper-deep px-1 py-px font-mono text-[0.92em]">
            {t.text}
          </code>
        );
      case "link":
        return (
          <a key={k} href={t.href} target="_blank" rel="noopener noreferrer nofollow" className="text-reaction underline decoration-reaction/40 underline-offset-2 hover:decoration-reaction">
            {t.text}
          </a>
        );
      case "mention":
        return (
          <span key={k} className="rounded bg-reaction-soft px-0.5 font-medium text-reaction" data-mention={t.userId}>
            {t.text}
          </span>
        );
    }
  });
}

export function CommentText({ text, members = [] }: { text: string; members?: Member[] }) {
  const lines = parseComment(text, members);
  return (
    <div className="break-words text-[13.5px] leading-relaxed text-ink" data-testid="comment-text">
      {lines.map((line, i) => (
        <Fragment key={i}>
          {i > 0 ? <br /> : null}
          {render(line)}
        </Fragment>
      ))}
    </div>
  );
}
