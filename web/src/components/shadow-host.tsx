/**
 * Renders its children inside a shadow root. CodeMirror injects its styles at
 * run time; into a document that means a <style> element, which the server's
 * Content-Security-Policy (style-src 'self') rightly refuses, while into a
 * shadow root it uses a constructed stylesheet, which the policy allows.
 */
import { useLayoutEffect, useRef, useState, type ReactNode } from 'react';
import { createPortal } from 'react-dom';

export function ShadowHost({ className, children }: { className?: string; children: (root: ShadowRoot) => ReactNode }) {
  const host = useRef<HTMLDivElement>(null);
  const [root, setRoot] = useState<ShadowRoot | null>(null);
  useLayoutEffect(() => {
    const el = host.current;
    if (el) setRoot(el.shadowRoot ?? el.attachShadow({ mode: 'open' }));
  }, []);
  return (
    <div ref={host} className={className}>
      {root && createPortal(children(root), root)}
    </div>
  );
}
