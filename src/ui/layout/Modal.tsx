import {
  useEffect,
  useLayoutEffect,
  useRef,
  useState,
  type KeyboardEvent,
  type ReactNode,
  type RefObject,
} from 'react';
import { createPortal } from 'react-dom';
import './modal.css';

const FOCUSABLE =
  'a[href], button:not([disabled]), input:not([disabled]):not([type="hidden"]), select:not([disabled]), ' +
  'textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

export interface ModalProps {
  /** Id of the element (a heading) that names the dialog. */
  readonly labelledBy: string;
  readonly describedBy?: string;
  /** Escape, or a close button inside, calls this; the dialog closes when its owner stops rendering it. */
  readonly onClose: () => void;
  /** What takes focus when the dialog opens (else the first focusable element). */
  readonly initialFocus?: RefObject<HTMLElement | null>;
  readonly className?: string;
  readonly children?: ReactNode;
}

/**
 * A modal dialog: drawn over the page in a layer of its own, named by its
 * heading, focus kept inside (Tab and Shift+Tab wrap), Escape closes, and the
 * rest of the page hidden from assistive technology and made inert while it
 * is open. Focus goes back to where it was when the dialog closes.
 */
export function Modal({ labelledBy, describedBy, onClose, initialFocus, className, children }: ModalProps) {
  const [host] = useState(() => {
    const el = document.createElement('div');
    el.className = 'modal-host';
    return el;
  });
  const boxRef = useRef<HTMLDivElement | null>(null);

  useLayoutEffect(() => {
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    document.body.appendChild(host);
    // The page behind is out of reach while the dialog is open.
    const hidden: { el: Element; ariaHidden: string | null; inert: boolean }[] = [];
    for (const el of Array.from(document.body.children)) {
      if (el === host) continue;
      hidden.push({ el, ariaHidden: el.getAttribute('aria-hidden'), inert: el.hasAttribute('inert') });
      el.setAttribute('aria-hidden', 'true');
      el.setAttribute('inert', '');
    }
    return () => {
      for (const { el, ariaHidden, inert } of hidden) {
        if (ariaHidden === null) el.removeAttribute('aria-hidden');
        else el.setAttribute('aria-hidden', ariaHidden);
        if (!inert) el.removeAttribute('inert');
      }
      host.remove();
      if (opener && opener.isConnected) opener.focus();
    };
  }, [host]);

  useEffect(() => {
    const box = boxRef.current;
    if (!box) return;
    const target = initialFocus?.current ?? box.querySelector<HTMLElement>(FOCUSABLE) ?? box;
    target.focus();
    // On opening only: later renders must not pull focus back. Callers pass a ref from useRef, the same
    // object on every render, so this runs again only if the dialog is told to focus another element.
  }, [initialFocus]);

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>): void => {
    if (e.key === 'Escape') {
      e.preventDefault();
      e.stopPropagation();
      onClose();
      return;
    }
    // Undo and redo of the page's history stay with the page: inside the dialog nothing is applied yet.
    if ((e.ctrlKey || e.metaKey) && ['z', 'y'].includes(e.key.toLowerCase())) {
      e.stopPropagation();
      return;
    }
    if (e.key !== 'Tab') return;
    const box = boxRef.current;
    if (!box) return;
    const items = Array.from(box.querySelectorAll<HTMLElement>(FOCUSABLE)).filter(
      (el) => el.tabIndex >= 0 && !el.closest('[hidden]'),
    );
    const first = items[0];
    const last = items[items.length - 1];
    if (!first || !last) {
      e.preventDefault();
      return;
    }
    const active = document.activeElement;
    if (e.shiftKey && (active === first || !box.contains(active))) {
      e.preventDefault();
      last.focus();
    } else if (!e.shiftKey && (active === last || !box.contains(active))) {
      e.preventDefault();
      first.focus();
    }
  };

  return createPortal(
    <div className="modal-backdrop">
      <div
        ref={boxRef}
        className={`modal${className ? ` ${className}` : ''}`}
        role="dialog"
        aria-modal="true"
        aria-labelledby={labelledBy}
        aria-describedby={describedBy}
        tabIndex={-1}
        onKeyDown={onKeyDown}
      >
        {children}
      </div>
    </div>,
    host,
  );
}
