// The few SVG parts the icons and the mark draw with. On native they are react-native-svg's; the web build
// takes line-svg.web.tsx, plain DOM SVG, so the sign-in screen does not load react-native-svg's web layer.
export { Circle, Path, default as Svg } from 'react-native-svg';
