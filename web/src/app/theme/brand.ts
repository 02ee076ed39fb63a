import {
  createDarkTheme,
  createLightTheme,
  type BrandVariants,
  type Theme,
} from '@fluentui/react-components';

/**
 * Ligament's own colour ramp: a deep oxidised teal, from near-black (10) to a pale verdigris (160).
 * This file is the one place in the web app that holds colour values; everything else reads
 * Fluent tokens derived from it.
 */
export const ligamentBrand: BrandVariants = {
  10: '#020F0F',
  20: '#061D1C',
  30: '#0A2A28',
  40: '#0D3634',
  50: '#104340',
  60: '#13504C',
  70: '#165D58',
  80: '#1A6A64',
  90: '#237871',
  100: '#31867E',
  110: '#42938B',
  120: '#56A098',
  130: '#6DADA6',
  140: '#87BBB4',
  150: '#A3CAC4',
  160: '#C1DAD5',
};

const fontFamilyBase = "'Lexend', 'Segoe UI', system-ui, sans-serif";

export const ligamentLightTheme: Theme = {
  ...createLightTheme(ligamentBrand),
  fontFamilyBase,
};

const dark = createDarkTheme(ligamentBrand);

// In the dark theme the brand foregrounds step up the ramp so text and links stay readable.
export const ligamentDarkTheme: Theme = {
  ...dark,
  fontFamilyBase,
  colorBrandForeground1: ligamentBrand[110],
  colorBrandForeground2: ligamentBrand[120],
  colorBrandForegroundLink: ligamentBrand[130],
  colorBrandForegroundLinkHover: ligamentBrand[140],
  colorBrandForegroundLinkPressed: ligamentBrand[120],
};
