import { KIND_IDS, type KindId } from '@sheaf/engine';
import { useEffect, useId, useRef, useState, type KeyboardEvent } from 'react';
import { KIND_VIEWS } from '../kinds/kindViews';

/**
 * A button that opens the list of every kind of cell; choosing one adds it. Arrow keys move
 * through the list, Escape closes it and gives focus back to the button.
 */
export function AddCellMenu({
  label,
  onAdd,
  compact = false,
}: {
  /** The button's words, e.g. "Add cell" or "Insert below S". */
  label: string;
  onAdd: (kind: KindId) => void;
  compact?: boolean;
}) {
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const button = useRef<HTMLButtonElement>(null);
  const menu = useRef<HTMLUListElement>(null);

  useEffect(() => {
    if (!open) return;
    menu.current?.querySelector<HTMLButtonElement>('[role="menuitem"]')?.focus();
    const onPointer = (event: PointerEvent) => {
      const target = event.target as Node;
      if (!menu.current?.contains(target) && !button.current?.contains(target)) setOpen(false);
    };
    document.addEventListener('pointerdown', onPointer);
    return () => document.removeEventListener('pointerdown', onPointer);
  }, [open]);

  const close = () => {
    setOpen(false);
    button.current?.focus();
  };
  const onMenuKey = (event: KeyboardEvent<HTMLUListElement>) => {
    const items = [...(menu.current?.querySelectorAll<HTMLButtonElement>('[role="menuitem"]') ?? [])];
    const index = items.indexOf(document.activeElement as HTMLButtonElement);
    if (event.key === 'Escape') {
      event.preventDefault();
      close();
    } else if (event.key === 'ArrowDown' || event.key === 'ArrowUp') {
      event.preventDefault();
      const step = event.key === 'ArrowDown' ? 1 : -1;
      items[(index + step + items.length) % items.length]?.focus();
    } else if (event.key === 'Home' || event.key === 'End') {
      event.preventDefault();
      items[event.key === 'Home' ? 0 : items.length - 1]?.focus();
    }
  };

  return (
    <div className="relative inline-block">
      <button
        ref={button}
        type="button"
        className={compact ? 'btn px-2 py-0.5 text-[0.8125rem]' : 'btn'}
        aria-haspopup="menu"
        aria-expanded={open}
        aria-controls={open ? menuId : undefined}
        onClick={() => setOpen((was) => !was)}
      >
        <span aria-hidden="true">+</span> {label}
      </button>
      {open ? (
        <ul
          ref={menu}
          id={menuId}
          role="menu"
          aria-label={label}
          onKeyDown={onMenuKey}
          className="absolute left-0 z-20 mt-1 w-[22rem] max-w-[90vw] border border-paper-rule bg-paper py-1 shadow-lg"
        >
          {KIND_IDS.map((kind) => (
            <li key={kind} role="none">
              <button
                type="button"
                role="menuitem"
                data-kind={kind}
                className="block w-full px-3 py-1.5 text-left hover:bg-paper-sunk focus:bg-accent-soft focus:outline-none"
                onClick={() => {
                  setOpen(false);
                  onAdd(kind);
                }}
              >
                <span className="block font-medium">{KIND_VIEWS[kind].label}</span>
                <span className="block text-[0.8125rem] text-ink-muted">{KIND_VIEWS[kind].hint}</span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
