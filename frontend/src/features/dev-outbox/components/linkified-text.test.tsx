import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LinkifiedText, splitLinks } from './linkified-text';

describe('LinkifiedText', () => {
  it('makes http(s) links clickable and leaves the sentence’s full stop outside the link', () => {
    render(<LinkifiedText text={'Join here: http://127.0.0.1:3100/invite?token=abc-123. Thanks!'} />);
    const link = screen.getByRole('link');
    expect(link).toHaveAttribute('href', 'http://127.0.0.1:3100/invite?token=abc-123');
    expect(link).toHaveTextContent('http://127.0.0.1:3100/invite?token=abc-123');
  });

  it('renders markup in the text as text, never as elements', () => {
    const { container } = render(<LinkifiedText text={'<b>bold</b> <a href="javascript:alert(1)">x</a>'} />);
    expect(container.querySelector('b')).toBeNull();
    expect(screen.queryByRole('link')).not.toBeInTheDocument();
    expect(container.textContent).toBe('<b>bold</b> <a href="javascript:alert(1)">x</a>');
  });

  it('keeps every character of the text across the pieces', () => {
    const text = 'a https://x.test/one and (https://x.test/two) end';
    const parts = splitLinks(text);
    expect(parts.map((p) => p.text).join('')).toBe(text);
    expect(parts.filter((p) => p.href).map((p) => p.href)).toEqual(['https://x.test/one', 'https://x.test/two']);
  });
});
