import '@fontsource/ibm-plex-sans/400.css';
import '@fontsource/ibm-plex-sans/500.css';
import '@fontsource/ibm-plex-sans/600.css';
import '@fontsource/fira-code/400.css';
import '@fontsource/fira-code/500.css';
// Radix Themes in parts: base tokens, only the colours the console uses, then components.
import '@radix-ui/themes/tokens/base.css';
import '@radix-ui/themes/tokens/colors/jade.css';
import '@radix-ui/themes/tokens/colors/sand.css';
import '@radix-ui/themes/tokens/colors/amber.css';
import '@radix-ui/themes/tokens/colors/red.css';
import '@radix-ui/themes/components.css';
import '@radix-ui/themes/utilities.css';
import '@/app/brand.css';
import '@/components/components.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from '@/app/app';

const container = document.getElementById('root');
if (container === null) throw new Error('index.html must contain an element with id "root"');

createRoot(container).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
