/**
 * Common passwords refused at sign-up, reset and password change.
 *
 * Source: "100k-most-used-passwords-NCSC.txt" in SecLists (danielmiessler/SecLists, MIT licence), the UK
 * National Cyber Security Centre's list of the passwords most often seen in breach corpora, ranked by
 * frequency. Only its first ~5,500 ranks were read for this file.
 *
 * - `longCommonPasswords`: every entry of 12 or more characters met in those ranks, verbatim (lower-cased).
 *   Most of them are also caught by the pattern rules in shared/schemas/password-rules.ts; they are kept
 *   so the list is checked on its own.
 * - `commonPasswordWords`: entries of 5+ letters from the same ranks that are a word, or a word with a digit
 *   after it (then the word alone is kept: "trustno1" gives "trustno"). A password that is one of
 *   these words padded with digits, symbols, keyboard runs or sequences (e.g. "sunshine2024!!") is refused.
 */
// prettier-ignore
export const longCommonPasswords: readonly string[] = [
  'q1w2e3r4t5y6', '1qaz2wsx3edc', 'qwerty123456', '123qweasdzxc', '123456654321', 'sojdlg123aljg',
  'pe#5gz29ptzmse', 'polniypizdec0211', 'megaparol12345', 'n8zgt5p0shw=', '123456qwerty', 'telechargement',
  '111222tianya', 'startfinding', 'yfdbufnjh10305070', '123456123456', 'qazwsxedcrfv', '1q2w3e4r5t6y7u8i9o0p',
  '123456789123', '112233445566', 'maprchem56458', '123456789987654321', 'polniypizdec110211', 'qwertyqwerty',
  'justinbieber', 'qweasdzxc123', '123456789123456789', '5532361cnjqrf', 'qwertyuiop[]', 'qazwsxedc123',
  'polniypizdec1102', 'professional', '1q2w3e4r5t6y7u', 'qwerasdfzxcv', 'qwertyuiop123', 'leavemealone',
  'temppassword', 'g13916055158', 'international',
];

// prettier-ignore
export const commonPasswordWords: readonly string[] = [
  'password', 'qwerty', 'iloveyou', 'monkey', 'dragon', 'myspace', 'computer', 'princess', 'ashley', 'michael',
  'football', 'sunshine', 'daniel', 'shadow', 'superman', 'jessica', 'baseball', 'killer', 'samsung', 'master',
  'azerty', 'charlie', 'soccer', 'jordan', 'linkedin', 'babygirl', 'thomas', 'liverpool', 'michelle', 'nicole',
  'lovely', 'andrew', 'joshua', 'justin', 'anthony', 'hello', 'jennifer', 'hunter', 'naruto', 'welcome',
  'tigger', 'parola', 'robert', 'loveme', 'apple', 'pokemon', 'mother', 'money', 'secret', 'purple', 'buster',
  'matthew', 'andrea', 'basketball', 'hannah', 'freedom', 'golfer', 'chelsea', 'george', 'trustno', 'friends',
  'william', 'amanda', 'number', 'chocolate', 'summer', 'flower', 'maggie', 'pakistan', 'samantha', 'letmein',
  'marina', 'batman', 'butterfly', 'forever', 'mustang', 'internet', 'london', 'harley', 'alexander', 'pepper',
  'family', 'loveyou', 'joseph', 'whatever', 'jasmine', 'orange', 'junior', 'cookie', 'martin', 'google',
  'patrick', 'ginger', 'mylove', 'arsenal', 'abcdef', 'taylor', 'brandon', 'angel', 'diamond', 'snoopy',
  'starwars', 'matrix', 'mickey', 'school', 'jonathan', 'melissa', 'eminem', 'lovers', 'nikita', 'richard',
  'yellow', 'oliver', 'cheese', 'christian', 'sophie', 'bailey', 'mercedes', 'victoria', 'peanut', 'sandra',
  'benjamin', 'elizabeth', 'prince', 'angels', 'angela', 'banana', 'barcelona', 'hockey', 'monster', 'carlos',
  'antonio', 'nathan', 'chicken', 'lucky', 'gabriel', 'silver', 'bubbles', 'hottie', 'rainbow', 'morgan',
  'natasha', 'jackson', 'austin', 'vanessa', 'madison', 'adidas', 'america', 'metallica', 'slipknot', 'jesus',
  'alexis', 'spiderman', 'steven', 'ferrari', 'lauren', 'tinkerbell', 'bandit', 'danielle', 'nicholas',
  'nirvana', 'destiny', 'scooter', 'juventus', 'rachel', 'monica', 'stella', 'yamaha', 'victor', 'ronaldo',
  'smokey', 'cocacola', 'booboo', 'heather', 'november', 'jasper', 'success', 'edward', 'valentina', 'sweety',
  'tennis', 'friend', 'nothing', 'casper', 'chester', 'spongebob', 'hahaha', 'hellokitty', 'alexandra',
  'canada', 'david', 'dennis', 'december', 'olivia', 'playboy', 'sabrina', 'patricia', 'mexico', 'dakota',
  'barbie', 'johnny', 'music', 'lover', 'pretty', 'nicolas', 'charles', 'phoenix', 'rebecca', 'thunder',
  'beautiful', 'carolina', 'vincent', 'jeremy', 'spider', 'sebastian', 'yankees', 'dallas', 'cameron',
  'caroline', 'guitar', 'midnight', 'elephant', 'scorpion', 'tweety', 'cowboys', 'louise', 'dolphin', 'loser',
  'lalala', 'veronica', 'sparky', 'newyork', 'adrian', 'september', 'heaven', 'jessie', 'crystal', 'tigers',
  'gemini', 'raiders', 'peaches', 'merlin', 'scooby', 'stephanie', 'shannon', 'james', 'lovelove', 'precious',
  'lakers', 'manchester', 'cristina', 'apples', 'daniela', 'jackie', 'rocky', 'sakura', 'sammy', 'muffin',
  'cherry', 'poohbear', 'flowers', 'cooper', 'blessed', 'toyota', 'beauty', 'emmanuel', 'genius', 'winston',
  'tiffany', 'charlotte', 'diablo', 'onelove', 'tiger', 'badboy', 'maverick', 'winner', 'creative', 'softball',
  'hotmail', 'brittany', 'garfield', 'kitty', 'steelers', 'rabbit', 'crazy', 'august', 'isabella', 'october',
  'green', 'black', 'kimberly', 'passion', 'soleil', 'ranger', 'dexter', 'popcorn', 'california', 'happy',
  'icecream', 'eagles', 'leonardo', 'police', 'christine', 'windows', 'snickers', 'cowboy', 'winter', 'dancer',
  'coffee', 'player', 'fernando', 'maxwell', 'swordfish', 'rangers', 'marlboro', 'kitten', 'twilight',
  'florida', 'sydney', 'pumpkin', 'natalie', 'hiphop', 'fishing', 'iloveme', 'hardcore', 'rockstar',
  'greenday', 'angelina', 'father', 'courtney', 'fluffy', 'kissme', 'trinity', 'alejandro', 'turtle',
  'corvette', 'lollipop', 'honey', 'motorola', 'friendster', 'portugal', 'simple', 'brooklyn', 'darkness',
  'slayer', 'snowball', 'chicago', 'people', 'golden', 'sweetie', 'awesome', 'boston', 'catherine', 'remember',
  'bulldog', 'cricket', 'single', 'blessing', 'goodluck', 'hammer', 'chance', 'strawberry', 'bigdaddy',
  'superstar', 'cookies', 'azertyuiop', 'porsche', 'teacher', 'bullshit', 'sunday', 'christopher', 'please',
  'gateway', 'ladybug', 'sweetpea', 'sunflower', 'sweetheart', 'ihateyou', 'paradise', 'doctor', 'kawasaki',
  'shopping', 'genesis', 'january', 'scarface', 'dolphins', 'facebook', 'changeme', 'australia', 'maryjane',
  'realmadrid', 'westside', 'vampire', 'linkinpark', 'inuyasha', 'falcon', 'rosebud', 'italia', 'disney',
  'warcraft', 'bestfriend', 'volleyball', 'champion', 'teddybear', 'passwort', 'maximus', 'victory', 'animal',
  'student', 'spirit', 'mariposa', 'abcdefgh', 'super', 'dreams', 'england', 'sniper', 'panther', 'nintendo',
  'happiness', 'engineer', 'princesa', 'penguin', 'newlife', 'blahblah', 'skyline', 'trouble', 'liberty',
  'godisgood', 'cupcake', 'potter', 'warrior', 'smile', 'online', 'wizard', 'kingkong', 'monday', 'mercury',
  'justice', 'knight', 'dreamer', 'hollywood', 'serenity', 'business', 'avatar', 'gangster', 'microsoft',
  'jupiter', 'rocket', 'system', 'titanic', 'thebest', 'hamster', 'skittles', 'sports', 'minecraft',
  'terminator', 'security', 'harrypotter', 'legend', 'truelove', 'fantasy', 'motdepasse', 'carpediem', 'admin',
  'unicorn', 'phantom', 'eclipse', 'pikachu', 'platinum', 'passport', 'jesuschrist', 'access', 'wisdom',
  'valentine', 'wolverine', 'jamesbond', 'fashion', 'goldfish', 'power', 'network', 'beatles', 'idontknow',
  'diamonds', 'cutiepie', 'digital', 'einstein', 'karate', 'kingdom', 'buttercup', 'manager', 'dragonball',
  'stargate', 'captain', 'infinity', 'pandora', 'general', 'dinosaur', 'runescape', 'therock', 'swimming',
  'travel', 'grandma', 'wachtwoord', 'senha', 'qwertyuiop',
  'asdfghjkl', 'zxcvbnm', 'qazwsx', 'qweasdzxc', 'drowssap', 'poiuytrewq',
];
