// Type declarations for fft-js (CommonJS, no bundled types): radix-2 FFT on power-of-two lengths.
declare module 'fft-js' {
  /** A complex number as [re, im]. */
  type Complex = [number, number];
  /** The module: forward and inverse DFT returning [re, im] pairs. */
  const fftJs: {
    /** Forward DFT of real samples or complex pairs. */
    fft(signal: number[] | Complex[]): Complex[];
    /** Inverse DFT. */
    ifft(signal: Complex[]): Complex[];
  };
  export default fftJs;
}
