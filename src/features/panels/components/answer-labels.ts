export const ENVIRONMENT_LABELS: Record<string, string> = {
  'indoor-dry': 'Indoor, dry and clean',
  'indoor-dusty': 'Indoor, dust or dripping',
  outdoor: 'Outdoor',
  washdown: 'Washdown (hose-directed water)',
  corrosive: 'Corrosive',
  'class1-div1': 'Hazardous: Class I Division 1 (gas)',
  'class1-div2': 'Hazardous: Class I Division 2 (gas)',
  'class2-div1': 'Hazardous: Class II Division 1 (dust)',
  'class2-div2': 'Hazardous: Class II Division 2 (dust)',
};
