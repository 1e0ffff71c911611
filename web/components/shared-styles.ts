/** Styles shared by the workbench's panels: one look for controls and headings. */
import { css } from 'lit';

export const panelStyles = css`
  :host { display: block; color: #1d2328; font: inherit; }
  h2 { font-size: 0.8rem; text-transform: uppercase; letter-spacing: 0.06em; margin: 0 0 0.4rem; color: #4a5560; }
  label { display: block; margin: 0.25rem 0; }
  select, input[type='number'], input[type='text'], button {
    font: inherit; padding: 0.2rem 0.4rem; border: 1px solid #9aa5b0; border-radius: 4px; background: #fff; color: inherit;
  }
  select { max-width: 100%; }
  button { cursor: pointer; }
  button:hover { background: #eef2f5; }
  :focus-visible { outline: 2px solid #0b5cad; outline-offset: 1px; }
  .hint { color: #56606a; font-size: 0.85em; }
  .problem { color: #8a1c00; }
  table { border-collapse: collapse; font-size: 0.85em; }
  th, td { border-bottom: 1px solid #dde3e8; padding: 0.15rem 0.4rem; text-align: left; vertical-align: top; }
  th { background: #eef2f5; font-weight: 600; }
`;
