/** The fade curve lives with the heat model, which uses it for fade feedback (lib/thermal/fade.ts). */
export { FADE_CURVE_LABEL, FADE_SHAPES, fadeCurveFor, frictionRatio, type FadeCurve, type FadeShape } from "@/lib/thermal";
