// Bundled with the app: Tressury must render the same with no network.
import '@fontsource/work-sans/400.css';
import '@fontsource/work-sans/600.css';
