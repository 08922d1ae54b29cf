import { definePreset } from '@primeuix/themes'
import Aura from '@primeuix/themes/aura'

/**
 * Touchproof's own look on PrimeVue's token system: a calm ink-blue for everything interactive,
 * cool blue-grey surfaces, and one warm signal colour (a burnt vermilion) reserved for failures.
 * Contrast: primary.700 on white is 10.4:1, signal.700 on white 8.3:1, muted text (surface.600) 6.7:1 (WCAG 2.2 AA text ≥ 4.5:1).
 */
const ink = {
  50: '#f1f5fb', 100: '#dde6f3', 200: '#bccde6', 300: '#8fa9d3', 400: '#5f80ba', 500: '#3f62a0',
  600: '#2f4d85', 700: '#263f6d', 800: '#21355a', 900: '#1d2d4b', 950: '#121c31',
}
const slate = {
  0: '#ffffff', 50: '#f6f8fb', 100: '#eceff5', 200: '#dce2ec', 300: '#c3ccda', 400: '#97a3b8', 500: '#5d6980',
  600: '#505c73', 700: '#3d475b', 800: '#2b3344', 900: '#1c2230', 950: '#11151e',
}
/** The one warm signal colour: used for "Fails" and destructive actions only. */
export const signal = {
  50: '#fdf3ee', 100: '#fbe2d6', 200: '#f5c0a8', 300: '#ec9570', 400: '#e06a3f', 500: '#b0421a',
  600: '#a8401a', 700: '#873417', 800: '#6c2b15', 900: '#582513', 950: '#30110a',
}

/** Message and toast text one step darker than the base theme's, for AA contrast on tinted backgrounds. */
const severityText = (palette: string) => ({ color: `{${palette}.800}`, outlined: { color: `{${palette}.800}` }, simple: { color: `{${palette}.800}` } })
const darkerSeverityText = {
  colorScheme: {
    light: { info: severityText('blue'), success: severityText('green'), warn: severityText('yellow'), error: severityText('red'), secondary: severityText('surface') },
  },
}

export const TouchproofPreset = definePreset(Aura, {
  primitive: {
    // Danger severities (buttons, messages, tags) all draw from the red palette: make it ours.
    red: signal,
    borderRadius: { none: '0', xs: '2px', sm: '3px', md: '5px', lg: '7px', xl: '10px' },
  },
  semantic: {
    primary: ink,
    focusRing: { width: '3px', style: 'solid', color: '{primary.500}', offset: '2px' },
    colorScheme: {
      light: {
        surface: slate,
        primary: { color: '{primary.700}', contrastColor: '#ffffff', hoverColor: '{primary.800}', activeColor: '{primary.900}' },
        highlight: { background: '{primary.100}', focusBackground: '{primary.200}', color: '{primary.900}', focusColor: '{primary.950}' },
        text: { color: '{surface.900}', hoverColor: '{surface.950}', mutedColor: '{surface.600}', hoverMutedColor: '{surface.700}' },
        formField: { borderColor: '{surface.400}', hoverBorderColor: '{primary.500}', placeholderColor: '{surface.600}' },
      },
    },
  },
  components: {
    message: darkerSeverityText,
    toast: { colorScheme: { light: { info: { color: '{blue.800}', detailColor: '{surface.800}' }, success: { color: '{green.800}', detailColor: '{surface.800}' }, warn: { color: '{yellow.800}', detailColor: '{surface.800}' }, error: { color: '{red.800}', detailColor: '{surface.800}' } } } },
  },
})
